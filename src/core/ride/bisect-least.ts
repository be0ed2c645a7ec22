// The least value in [lo, hi] at which a condition holds, by bisection, for a
// condition that holds from some value upwards. leastOnGrid first walks a
// rising grid to the first value that holds, so a condition that holds only
// on a middle band (too little damping lets the crew bounce, too much ties
// them to a jolting floor) is still bracketed from below.

export interface LeastValue {
  /** The least value found; null when the condition fails even at hi. */
  value: number | null;
  /** True when the condition already holds at lo (the value is then lo). */
  atLower: boolean;
  evaluations: number;
}

export function bisectLeast(holds: (x: number) => boolean, lo: number, hi: number, relTol = 1e-3): LeastValue {
  const evaluations = 2;
  if (holds(lo)) return { value: lo, atLower: true, evaluations: 1 };
  if (!holds(hi)) return { value: null, atLower: false, evaluations };
  const inner = bisectInside(holds, lo, hi, relTol);
  return { value: inner.value, atLower: false, evaluations: evaluations + inner.evaluations };
}

export function leastOnGrid(holds: (x: number) => boolean, grid: readonly number[], relTol = 1e-3): LeastValue {
  for (let k = 0; k < grid.length; k++) {
    if (!holds(grid[k])) continue;
    if (k === 0) return { value: grid[0], atLower: true, evaluations: 1 };
    const inner = bisectInside(holds, grid[k - 1], grid[k], relTol);
    return { value: inner.value, atLower: false, evaluations: k + 1 + inner.evaluations };
  }
  return { value: null, atLower: false, evaluations: grid.length };
}

/** Halvings at most: 60 take any bracket of doubles below a millionth of itself. */
export const MAX_BISECTIONS = 60;

/** Bisection between lo (fails) and hi (holds); the value holds whenever it stops. */
function bisectInside(holds: (x: number) => boolean, lo: number, hi: number, relTol: number): { value: number; evaluations: number } {
  let evaluations = 0;
  while (hi - lo > relTol * hi && evaluations < MAX_BISECTIONS) {
    const mid = 0.5 * (lo + hi);
    evaluations++;
    if (holds(mid)) hi = mid;
    else lo = mid;
  }
  return { value: hi, evaluations };
}
