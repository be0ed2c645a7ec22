// The planner on cases worked by hand: kerf, prices over two stock lengths,
// availability limits, labels, and first-fit decreasing alone.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { CuttingInstance, CuttingPlan, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { StockShortfallError } from '../../src/core/stock/stock-shortfall.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

const lengths = (plan: CuttingPlan) => plan.patterns.map((p) => ({ stock: p.stock_length_mm, count: p.count, cuts: p.cuts.map((c) => c.length_mm), offcut: p.offcut_mm }));

/** Plan with the solver, check the plan is sound, and return it. */
function solved(inst: CuttingInstance): CuttingPlan {
  const plan = planCutting(inst, lp);
  expect(planProblems(inst, plan)).toEqual([]);
  return plan;
}

describe('kerf: a cut takes length + kerf; the last piece needs none when it runs to the end', () => {
  it('3 x 330 mm with a 5 mm kerf fill 1000 mm exactly: 3 x 330 + 2 x 5 = 1000', () => {
    const plan = solved({ kerf_mm: 5, stock: [{ length_mm: 1000 }], pieces: [{ length_mm: 330, quantity: 3 }] });
    expect(lengths(plan)).toEqual([{ stock: 1000, count: 1, cuts: [330, 330, 330], offcut: 0 }]);
  });

  it('3 x 331 mm do not: 3 x 331 + 2 x 5 = 1003 > 1000, so two stock pieces', () => {
    const plan = solved({ kerf_mm: 5, stock: [{ length_mm: 1000 }], pieces: [{ length_mm: 331, quantity: 3 }] });
    expect(plan.pieces_used).toBe(2);
    // Offcuts after the last cut's kerf: 1000 - 2 x 331 - 2 x 5 = 328; 1000 - 331 - 5 = 664.
    expect(lengths(plan).map((p) => p.offcut).sort((a, b) => a - b)).toEqual([328, 664]);
    // Waste counts kerfs and offcuts: 2000 - 3 x 331 = 1007.
    expect(plan.waste_mm).toBe(1007);
  });

  it('fractional lengths and kerf: 4 x 742.5 + 3 x 3.2 = 2979.6 <= 3000, a fifth does not fit', () => {
    const plan = solved({ kerf_mm: 3.2, stock: [{ length_mm: 3000 }], pieces: [{ length_mm: 742.5, quantity: 8 }] });
    // Offcut: 3000 - 4 x 742.5 - 4 x 3.2 = 17.2.
    expect(lengths(plan)).toEqual([{ stock: 3000, count: 2, cuts: [742.5, 742.5, 742.5, 742.5], offcut: 17.2 }]);
  });
});

describe('prices over two stock lengths', () => {
  // 5 x 1200 mm: 3600 mm holds 3 (price 14), 2400 mm holds 2 (price 10).
  // 3600 + 2400 = 24; 2 x 3600 = 28; 3 x 2400 = 30. LP bound: 5 pieces at
  // 14/3 each = 23.33, rounded up to a whole multiple of gcd(14, 10) = 2: 24.
  const inst: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 2400, cost: 10 }, { length_mm: 3600, cost: 14 }], pieces: [{ length_mm: 1200, quantity: 5 }] };

  it('buys the cheapest mix and proves it by the bound', () => {
    const plan = solved(inst);
    expect(plan.cost).toBe(24);
    expect(plan.bought).toEqual([
      { length_mm: 2400, count: 1, cost: 10 },
      { length_mm: 3600, count: 1, cost: 14 },
    ]);
    expect(plan.lower_bound).toBeCloseTo((5 * 14) / 3, 6);
    expect(plan.optimal).toBe(true);
  });

  it('without prices it minimises the count and then takes the shorter stock', () => {
    const plan = solved({ ...inst, stock: inst.stock.map((s) => ({ length_mm: s.length_mm })) });
    expect(plan.cost).toBeNull();
    expect(plan.pieces_used).toBe(2);
    expect(plan.waste_mm).toBe(0);
  });

  it('cost and count disagree: 3 x 1000 mm from one 3000 (price 10) or three 1000 (price 3 each)', () => {
    const stock = [{ length_mm: 3000, cost: 10 }, { length_mm: 1000, cost: 3 }];
    const byCost = solved({ kerf_mm: 0, stock, pieces: [{ length_mm: 1000, quantity: 3 }] });
    expect(byCost.bought).toEqual([{ length_mm: 1000, count: 3, cost: 9 }]);
    const byCount = solved({ kerf_mm: 0, stock: stock.map((s) => ({ length_mm: s.length_mm })), pieces: [{ length_mm: 1000, quantity: 3 }] });
    expect(byCount.bought).toEqual([{ length_mm: 3000, count: 1, cost: null }]);
  });
});

describe('availability', () => {
  it('one 3000 mm piece available: 4 x 1500 mm take it and two of 2000 mm', () => {
    const plan = solved({ kerf_mm: 0, stock: [{ length_mm: 3000, available: 1 }, { length_mm: 2000 }], pieces: [{ length_mm: 1500, quantity: 4 }] });
    expect(plan.bought).toEqual([
      { length_mm: 3000, count: 1, cost: null },
      { length_mm: 2000, count: 2, cost: null },
    ]);
    expect(plan.optimal).toBe(true);
  });

  // 5, 4, 4, 3, 2, 2 in 10: first-fit decreasing packs [5 4] [4 3 2] [2],
  // three pieces; [5 3 2] [4 4 2] needs two.
  const tight: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 10, available: 2 }], pieces: [5, 4, 4, 3, 2, 2].map((length_mm) => ({ length_mm, quantity: 1 })) };

  it('where first-fit decreasing runs out, the solver still finds a plan', () => {
    expect(() => planCutting(tight, undefined)).toThrow(StockShortfallError);
    const plan = solved(tight);
    expect(plan.pieces_used).toBe(2);
    // The baseline is first-fit with the limit lifted: a count to compare.
    expect(plan.baseline.pieces_used).toBe(3);
  });

  it('where no plan exists, it says so', () => {
    const none = { ...tight, stock: [{ length_mm: 10, available: 1 }] };
    expect(() => planCutting(none, lp)).toThrow(/no plan was found that cuts every piece/);
  });
});

describe('first-fit decreasing alone (no solver)', () => {
  it('6, 5, 4, 3, 2 in 10: [6 4] and [5 3 2], meeting the length bound 20 / 10 = 2', () => {
    const inst: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 10 }], pieces: [6, 5, 4, 3, 2].map((length_mm) => ({ length_mm, quantity: 1 })) };
    const plan = planCutting(inst, undefined);
    expect(plan.method).toBe('first-fit decreasing');
    expect(lengths(plan)).toEqual([
      { stock: 10, count: 1, cuts: [6, 4], offcut: 0 },
      { stock: 10, count: 1, cuts: [5, 3, 2], offcut: 0 },
    ]);
    expect(plan.lower_bound).toBe(2);
    expect(plan.optimal).toBe(true);
    expect(planProblems(inst, plan)).toEqual([]);
  });

  it('5, 4, 4, 3, 2, 2 in 10: three pieces, not proved; the solver needs two', () => {
    const inst: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 10 }], pieces: [5, 4, 4, 3, 2, 2].map((length_mm) => ({ length_mm, quantity: 1 })) };
    const alone = planCutting(inst, undefined);
    expect(lengths(alone).map((p) => p.cuts)).toEqual([[5, 4], [4, 3, 2], [2]]);
    expect(alone.optimal).toBe(false);
    expect(alone.gap).toBeCloseTo(0.5, 9);
    const plan = solved(inst);
    expect(plan.pieces_used).toBe(2);
    expect(plan.baseline).toEqual({ pieces_used: 3, cost: null });
  });
});

it('keeps labels: pieces of one length with two labels are cut in their own quantities', () => {
  const inst: CuttingInstance = {
    kerf_mm: 3,
    stock: [{ length_mm: 2400 }],
    pieces: [
      { length_mm: 742, quantity: 4, label: 'spoke' },
      { length_mm: 742, quantity: 2, label: 'spare spoke' },
      { length_mm: 600, quantity: 1 },
    ],
  };
  const plan = solved(inst);
  const cut = (label: string) => plan.patterns.reduce((n, p) => n + p.count * p.cuts.filter((c) => c.label === label).length, 0);
  expect([cut('spoke'), cut('spare spoke'), cut('600 mm')]).toEqual([4, 2, 1]);
});

it('loads the solver once', async () => {
  expect(loadLpSolver()).toBe(loadLpSolver());
  expect(await loadLpSolver()).toBe(lp);
});
