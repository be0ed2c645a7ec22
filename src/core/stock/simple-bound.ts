import type { CuttingProblem } from './cutting-problem.ts';

/**
 * The length bound: all the pieces with their kerfs, laid end to end, over
 * the best stock (longest by count, cheapest per length by cost). Ignores
 * availability, so it holds for every plan. In real lengths, not grid steps.
 */
export function simpleBound(p: CuttingProblem): number {
  if (p.types.length === 0) return 0;
  const need = p.types.reduce((s, t) => s + (t.length_mm + p.kerf_mm) * t.demand, 0);
  const perLength = Math.min(...p.stocks.map((s) => s.weight / (s.length_mm + p.kerf_mm)));
  return need * perLength;
}
