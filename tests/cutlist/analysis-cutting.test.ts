import { describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { Analysis } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

describe('the cutting result on the analysis', () => {
  it('is computed once, and without a solver plans by first-fit decreasing', () => {
    const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData);
    expect(a.cutting).toBe(a.cutting);
    expect(a.cutting.stock_plan.groups.every((g) => g.plan.method === 'first-fit decreasing')).toBe(true);
  });

  it('with the solver, the demo plan is no worse than first-fit decreasing and cuts every part it serves', async () => {
    const spec = prepared(readDemo('demo-two-crew'));
    const lp = await loadLpSolver();
    const withLp = new Analysis(spec, rulesData, lp).cutting;
    const without = new Analysis(spec, rulesData).cutting;
    expect(withLp.stock_plan.cost!).toBeLessThanOrEqual(without.stock_plan.cost! + 1e-9);
    for (const g of withLp.stock_plan.groups) {
      expect(g.plan.cost!).toBeGreaterThanOrEqual(g.plan.lower_bound - 1e-6);
      for (const p of g.plan.patterns) expect(p.cuts.reduce((s, c) => s + c.length_mm, 0) + (p.cuts.length - 1) * spec.stock.kerf_mm).toBeLessThanOrEqual(p.stock_length_mm);
    }
    // Every served part, spares included, is cut exactly as often as the cut list asks.
    const unserved = new Set(withLp.stock_plan.unserved.map((u) => u.part));
    for (const item of withLp.cut_list.filter((i) => !unserved.has(i.part))) {
      const cut = withLp.stock_plan.groups.flatMap((g) => g.plan.patterns.flatMap((p) => Array(p.count).fill(p.cuts.filter((c) => c.label === item.part).length))).reduce((s, n) => s + n, 0);
      expect(cut, item.part).toBe(item.quantity + item.spares);
    }
  });
});
