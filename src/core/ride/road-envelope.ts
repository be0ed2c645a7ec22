// The road under a wheel: a raised-cosine bump of height h and length L
// (zero slope at both ends), and the path of a rigid wheel's centre over it,
// the envelope E(x) = max over s of [z(s) + sqrt(r² − (x − s)²)] − r
// (mechanics note, section 8). Its slope follows from the envelope theorem,
// dE/dx = (s* − x)/sqrt(r² − (x − s*)²) at the touching point s*. The envelope
// is tabulated with its exact slopes between the points where the wheel first
// and last touches the bump (where the slope jumps: the wheel strikes), and
// read by cubic Hermite interpolation. Metres throughout.

export interface Bump {
  height: number;
  length: number;
}

export function bumpHeight(b: Bump, s: number): number {
  if (s <= 0 || s >= b.length) return 0;
  return (b.height / 2) * (1 - Math.cos((2 * Math.PI * s) / b.length));
}

/** Samples of the coarse search. */
const COARSE = 48;

/** The bump's heights at the coarse search's samples between lo and hi, kept while the next point searches the same span. */
export interface CoarseHeights {
  lo: number;
  hi: number;
  h: Float64Array;
}

export const coarseHeights = (): CoarseHeights => ({ lo: NaN, hi: NaN, h: new Float64Array(COARSE + 1) });

/**
 * The rigid wheel's lift over the bump with its centre at x (bump from 0 to L), its slope, and where it touches.
 * `memo`, for one bump only: the coarse samples' heights, the same wherever the whole bump is within the wheel's reach.
 */
export function envelopeAt(b: Bump, r: number, x: number, memo?: CoarseHeights): { z: number; slope: number; s: number } {
  const lo = Math.max(0, x - r), hi = Math.min(b.length, x + r);
  if (hi <= lo) return { z: 0, slope: 0, s: x };
  // The wheel's lowest point over s, standing on the bump's height h there.
  const over = (h: number, s: number) => h + Math.sqrt(Math.max(0, r * r - (x - s) ** 2)) - r;
  const lift = (s: number) => over(bumpHeight(b, s), s);
  // Coarse search, then golden section round the best sample.
  const n = COARSE;
  if (memo && (memo.lo !== lo || memo.hi !== hi)) {
    memo.lo = lo;
    memo.hi = hi;
    for (let i = 0; i <= n; i++) memo.h[i] = bumpHeight(b, lo + ((hi - lo) * i) / n);
  }
  let best = lo, bestV = -Infinity;
  for (let i = 0; i <= n; i++) {
    const s = lo + ((hi - lo) * i) / n;
    const v = memo ? over(memo.h[i], s) : lift(s);
    if (v > bestV) [best, bestV] = [s, v];
  }
  const step = (hi - lo) / n;
  let a = Math.max(lo, best - step), c = Math.min(hi, best + step);
  const phi = (Math.sqrt(5) - 1) / 2;
  let x1 = c - phi * (c - a), x2 = a + phi * (c - a), f1 = lift(x1), f2 = lift(x2);
  for (let i = 0; i < 60 && c - a > 1e-12; i++) {
    if (f1 > f2) { c = x2; x2 = x1; f2 = f1; x1 = c - phi * (c - a); f1 = lift(x1); }
    else { a = x1; x1 = x2; f1 = f2; x2 = a + phi * (c - a); f2 = lift(x2); }
  }
  const [s, z] = f1 > f2 ? [x1, f1] : [x2, f2];
  if (z <= 0) return { z: 0, slope: 0, s: x };
  return { z, slope: (s - x) / Math.sqrt(r * r - (x - s) ** 2), s };
}

export interface Envelope {
  /** Lift of the wheel centre into out[0] and its slope d(lift)/dx into out[1], at x. */
  at(x: number, out: Float64Array): void;
  /** Where the wheel first and last touches the bump, m (the envelope's kinks). */
  start: number;
  end: number;
}

/** Where the envelope leaves zero between a (zero) and b (above zero), by bisection. */
function edge(bump: Bump, r: number, a: number, b: number): number {
  for (let i = 0; i < 80 && Math.abs(b - a) > 1e-12; i++) {
    const m = 0.5 * (a + b);
    if (envelopeAt(bump, r, m).z > 0) b = m;
    else a = m;
  }
  return b;
}

export function wheelEnvelope(b: Bump, r: number, dx = 0.001): Envelope {
  if (b.height <= 0) return { start: 0, end: 0, at: (_x, out) => void out.fill(0) };
  const reach = Math.min(r, Math.sqrt(2 * r * b.height)) + 1e-6;
  const start = edge(b, r, -reach, b.length / 2);
  const end = edge(b, r, b.length + reach, b.length / 2);
  const n = Math.max(4, Math.ceil((end - start) / dx));
  const h = (end - start) / n;
  const z = new Float64Array(n + 1), slope = new Float64Array(n + 1);
  const memo = coarseHeights();
  for (let i = 0; i <= n; i++) {
    const e = envelopeAt(b, r, Math.min(end, Math.max(start, start + i * h)), memo);
    z[i] = e.z;
    slope[i] = e.slope;
  }
  return {
    start,
    end,
    at(x, out) {
      if (x <= start || x >= end) return void out.fill(0);
      const u = (x - start) / h;
      const i = Math.min(n - 1, Math.floor(u));
      const t = u - i, t2 = t * t, t3 = t2 * t;
      const p0 = z[i], p1 = z[i + 1], m0 = slope[i] * h, m1 = slope[i + 1] * h;
      out[0] = (2 * t3 - 3 * t2 + 1) * p0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * p1 + (t3 - t2) * m1;
      out[1] = ((6 * t2 - 6 * t) * p0 + (3 * t2 - 4 * t + 1) * m0 + (-6 * t2 + 6 * t) * p1 + (3 * t2 - 2 * t) * m1) / h;
    },
  };
}
