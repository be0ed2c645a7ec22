// The least value in [lo, hi] at which a condition holds, by bisection, for a
// condition that holds from some value upwards (more damping, never worse).

export interface LeastValue {
  /** The least value found; null when the condition fails even at hi. */
  value: number | null;
  /** True when the condition already holds at lo (the value is then lo). */
  atLower: boolean;
  evaluations: number;
}

export function bisectLeast(holds: (x: number) => boolean, lo: number, hi: number, relTol = 1e-3): LeastValue {
  let evaluations = 2;
  if (holds(lo)) return { value: lo, atLower: true, evaluations: 1 };
  if (!holds(hi)) return { value: null, atLower: false, evaluations };
  while (hi - lo > relTol * hi) {
    const mid = 0.5 * (lo + hi);
    evaluations++;
    if (holds(mid)) hi = mid;
    else lo = mid;
  }
  return { value: hi, atLower: false, evaluations };
}
