import { bySize, type Dims } from './members.ts';

// The sections of a size series on which a member's own rule passes, found
// without trying them all: the rule's stress falls as either dimension grows
// (a larger section is stiffer and stronger in every mode the member rules
// check; its extra weight is small beside that), so for each width there is
// a least passing depth, and it does not grow as the width grows. A staircase
// walk from the widest width finds every width's least depth in about as
// many trials as there are widths and depths.

/** True where the rule passes with the section; null where the trial budget is spent. */
export type PassTest = (dims: Dims) => boolean | null;

export interface Frontier {
  /** Every section on or above the staircase, smallest first (at most `cap`). */
  passing: Dims[];
  /** False where the budget ran out before the walk finished. */
  complete: boolean;
}

/** The least index of `axis` where test passes, by bisection (the test is monotone along it); -1 where none; null when the budget is spent. */
function leastPassing(axis: readonly number[], at: (v: number) => boolean | null, from = 0): number | null {
  let lo = from;
  let hi = axis.length - 1;
  const top = at(axis[hi]);
  if (top === null) return null;
  if (!top) return -1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    const ok = at(axis[mid]);
    if (ok === null) return null;
    if (ok) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

export function seriesFrontier(axes: readonly number[][], test: PassTest, cap: number): Frontier {
  if (axes.length === 1) {
    const i = leastPassing(axes[0], (d) => test([d]));
    if (i === null) return { passing: [], complete: false };
    return { passing: i < 0 ? [] : axes[0].slice(i).slice(0, cap).map((d) => [d]), complete: true };
  }
  const [widths, depths] = axes;
  const least = new Map<number, number>();
  // The widest width first, by bisection; then each narrower width starts where the wider one stopped.
  let j = leastPassing(depths, (d) => test([widths[widths.length - 1], d]));
  if (j === null) return { passing: [], complete: false };
  let complete = true;
  if (j >= 0) {
    least.set(widths.length - 1, j);
    for (let i = widths.length - 2; i >= 0; i--) {
      let ok = test([widths[i], depths[j]]);
      while (ok === false && j < depths.length - 1) ok = test([widths[i], depths[++j]]);
      if (ok === null) {
        complete = false;
        break;
      }
      if (!ok) break;
      least.set(i, j);
    }
  }
  const passing: Dims[] = [];
  for (const [i, jMin] of least) for (let k = jMin; k < depths.length; k++) passing.push([widths[i], depths[k]]);
  return { passing: passing.sort(bySize).slice(0, cap), complete };
}
