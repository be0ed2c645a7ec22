// The root of a continuous function between two points where its signs
// differ, by the Illinois variant of regula falsi (dowell-jarratt-1971): the
// false position, halving the kept end's value whenever the same end is kept
// twice, which gives superlinear convergence without regula falsi's stall.

/** Iterations at most: far more than the tolerance needs on any bracket of a step. */
const MAX_ITERATIONS = 60;

/** A root of g in [a, b], with ga = g(a) and gb = g(b) of opposite signs (or one zero), to within tol in the argument. */
export function illinois(g: (x: number) => number, a: number, b: number, ga: number, gb: number, tol: number): number {
  if (ga === 0) return a;
  if (gb === 0) return b;
  let side = 0;
  for (let i = 0; i < MAX_ITERATIONS && Math.abs(b - a) > tol; i++) {
    const c = (a * gb - b * ga) / (gb - ga);
    const gc = g(c);
    if (gc === 0) return c;
    if (gc * gb < 0) {
      [a, ga] = [b, gb];
      side = 0;
    } else if (side === -1) ga /= 2;
    else side = -1;
    [b, gb] = [c, gc];
  }
  return Math.abs(ga) < Math.abs(gb) ? a : b;
}
