// Axis ranges and tick marks for the report's charts. Tick steps are "nice
// numbers" (1, 2 or 5 times a power of ten) as Heckbert defines them (P. S.
// Heckbert, "Nice numbers for graph labels", Graphics Gems, Academic Press
// 1990, pp. 61-63): the span divided by the number of ticks wanted, rounded
// to the nearest nice number. (Heckbert first rounds the span itself up to a
// nice number, which can halve the ticks; a plot 240 px high wants its six.)

export type Domain = readonly [number, number];

/** A nice number near x: the nearest of 1, 2, 5, 10 times its power of ten when `round`, else the next above. */
export function niceNumber(x: number, round: boolean): number {
  if (!(x > 0) || !Number.isFinite(x)) return 1;
  const power = 10 ** Math.floor(Math.log10(x));
  const f = x / power;
  const nice = round ? (f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10) : f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
  return nice * power;
}

/** The tick step for about `count` ticks over the domain. */
export function tickStep(domain: Domain, count: number): number {
  return niceNumber((domain[1] - domain[0]) / Math.max(1, count - 1), true);
}

/** The domain widened out to whole tick steps (a chart free to choose its own range). */
export function niceDomain(domain: Domain, count: number): [number, number] {
  const [lo, hi] = spread(domain);
  const step = tickStep([lo, hi], count);
  return [Math.floor(lo / step + 1e-9) * step || 0, Math.ceil(hi / step - 1e-9) * step || 0];
}

/** A domain with some width: a single value gets a unit either side (or a tenth of itself). */
export function spread(domain: Domain): [number, number] {
  const [lo, hi] = domain;
  if (hi > lo) return [lo, hi];
  const half = Math.abs(lo) * 0.1 || 1;
  return [lo - half, hi + half];
}

export interface Ticks {
  values: number[];
  /** Decimals that tell the ticks apart. */
  decimals: number;
}

/** The nice ticks inside the domain (ends included where they fall on a step). */
export function ticksWithin(domain: Domain, count: number): Ticks {
  const [lo, hi] = spread(domain);
  const step = tickStep([lo, hi], count);
  const values: number[] = [];
  for (let i = Math.ceil(lo / step - 1e-9); i * step <= hi + 1e-9 * step; i++) values.push(i * step || 0);
  return { values, decimals: Math.max(0, -Math.floor(Math.log10(step) + 1e-9)) };
}

/** Past this many decimals a tick is written with its power of ten. */
const MOST_DECIMALS = 6;

/** A tick's text: the step's decimals, a thin space between thousands, and no "-0". */
export function tickText(v: number, decimals: number): string {
  if (decimals > MOST_DECIMALS) return v === 0 ? '0' : v.toExponential(2).replace('e-', 'e\u2212');
  const text = v.toFixed(decimals);
  const [whole, frac] = (Number(text) === 0 ? (0).toFixed(decimals) : text).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
  return frac ? `${grouped}.${frac}` : grouped;
}

/** The linear map from a domain onto a range of paper. */
export function linear(domain: Domain, range: Domain): (v: number) => number {
  const [d0, d1] = spread(domain);
  const k = (range[1] - range[0]) / (d1 - d0);
  return (v) => range[0] + (v - d0) * k;
}
