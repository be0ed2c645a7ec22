// Every plan's objective is a whole combination of the stock prices, so it is
// a multiple of their greatest common divisor; a bound can then be rounded up
// to that multiple. Prices are read to 1e-6 of a unit; beyond that, 0 (unknown).

export function objectiveStep(weights: number[]): number {
  for (const scale of [1, 100, 10_000, 1_000_000]) {
    const ints = weights.map((w) => w * scale);
    if (ints.every((x) => Math.abs(x - Math.round(x)) < 1e-6)) {
      const g = ints.map(Math.round).reduce(gcd, 0);
      return g / scale;
    }
  }
  return 0;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** The least objective value a plan can have, given a lower bound. */
export function roundUpBound(bound: number, step: number): number {
  if (step <= 0) return bound;
  return Math.ceil(bound / step - 1e-7) * step;
}
