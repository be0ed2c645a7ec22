import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { DenseSimplex, type DenseColumn } from './dense-simplex.ts';
import { boundedKnapsack } from './knapsack.ts';
import { artificialCost, startPatterns } from './master-start.ts';
import { patternKey, type Pattern } from './pattern.ts';
import type { WorkMeter } from './work-meter.ts';

// The Gilmore-Gomory pattern LP of a small problem, priced to optimality by
// the same bounded knapsack as the solver's master, on the dense simplex:
// the same LP as pattern-master.ts (demand rows "at least", availability
// rows "at most", an artificial column per demand row), so the same optimum.

/** Pivots and pricing rounds one small LP may take before it is left to the LP solver. */
export const SMALL_LP_MAX_PIVOTS = 5_000;
export const SMALL_LP_MAX_ROUNDS = 500;

/** The LP optimum, or null where the work above did not reach it. */
export function smallPatternLp(p: CuttingProblem, start: Bin[] | null, meter: WorkMeter): number | null {
  const T = p.types.length;
  const availRow = p.stocks.map(() => -1);
  const rhs = p.types.map((t) => t.demand);
  p.stocks.forEach((s, k) => {
    if (s.available === Infinity) return;
    availRow[k] = rhs.length;
    rhs.push(s.available);
  });
  const m = rhs.length;
  const unit = (r: number, v: number): Float64Array => {
    const a = new Float64Array(m);
    a[r] = v;
    return a;
  };
  const column = (pat: Pattern): DenseColumn => {
    const a = new Float64Array(m);
    pat.counts.forEach((c, i) => (a[i] = c));
    if (availRow[pat.stock] >= 0) a[availRow[pat.stock]] = 1;
    return { cost: p.stocks[pat.stock].weight, a };
  };
  // Artificials (the start basis of the demand rows), surpluses, then slacks (the start basis of the availability rows).
  const big = artificialCost(p);
  const cols: DenseColumn[] = [...p.types.map((_, i) => ({ cost: big, a: unit(i, 1) })), ...p.types.map((_, i) => ({ cost: 0, a: unit(i, -1) }))];
  const basis = p.types.map((_, i) => i);
  for (let r = T; r < m; r++) {
    basis.push(cols.length);
    cols.push({ cost: 0, a: unit(r, 1) });
  }
  const lp = new DenseSimplex(Float64Array.from(rhs), cols, basis);
  const known = new Set<string>();
  const remember = (pat: Pattern): void => {
    const key = patternKey(pat);
    if (known.has(key)) return;
    known.add(key);
    lp.add(column(pat));
  };
  startPatterns(p, start).forEach(remember);
  try {
    for (let round = 0; round < SMALL_LP_MAX_ROUNDS; round++) {
      if (!lp.solve(SMALL_LP_MAX_PIVOTS)) return null;
      const y = lp.duals();
      const { best, cells } = boundedKnapsack(
        p.types.map((t, i) => ({ size: t.size, value: y[i], bound: t.demand })),
        p.stocks.map((s) => s.capacity),
      );
      meter.spend('dpCells', cells);
      const before = known.size;
      p.stocks.forEach((s, k) => {
        const mu = availRow[k] >= 0 ? y[availRow[k]] : 0;
        if (s.weight - mu - best[k].value < -1e-9 * Math.max(1, s.weight)) remember({ stock: k, counts: best[k].counts });
      });
      if (known.size === before) return lp.value();
      meter.spend('columns', known.size - before);
    }
    return null;
  } finally {
    meter.spend('simplexIterations', lp.pivots);
  }
}
