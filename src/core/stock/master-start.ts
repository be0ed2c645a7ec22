import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { binPattern, type Pattern } from './pattern.ts';

// What a pattern master starts from, shared by the solver's master and the
// small dense one so both solve the same LP.

/**
 * The starting bins' patterns, then one single-type pattern per piece type
 * and stock that holds it, so the master is never short of columns.
 */
export function startPatterns(p: CuttingProblem, start: Bin[] | null): Pattern[] {
  const out: Pattern[] = (start ?? []).map((b) => binPattern(p, b));
  p.types.forEach((t, i) => {
    p.stocks.forEach((s, k) => {
      const n = Math.min(t.demand, Math.floor(s.capacity / t.size));
      if (n > 0) out.push({ stock: k, counts: p.types.map((_, j) => (j === i ? n : 0)) });
    });
  });
  return out;
}

/**
 * Price of the artificial column of a demand row: above any plan (every
 * piece on its own stock piece at the dearest price), so the master is
 * feasible from the start and still a relaxation.
 */
export function artificialCost(p: CuttingProblem): number {
  return (p.types.reduce((s, t) => s + t.demand, 0) + 1) * Math.max(1, ...p.stocks.map((s) => s.weight));
}
