// The textbook cutting-stock example (tests/support/textbook-cutstock.ts:
// Gilmore & Gomory 1961, as GAMS CUTSTOCK): LP bound 452.25 rolls, integer optimum 453.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting, type CuttingMethod } from '../../src/core/stock/plan-cutting.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';
import { CUTSTOCK, LP_BOUND, OPTIMUM } from '../support/textbook-cutstock.ts';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

describe.each<CuttingMethod>(['column generation', 'arc flow'])('CUTSTOCK by %s', (method) => {
  it('finds the published LP bound and integer optimum, proved, with a valid plan', () => {
    const plan = planCutting(CUTSTOCK, lp, { method });
    expect(plan.lower_bound).toBeCloseTo(LP_BOUND, 6);
    expect(plan.pieces_used).toBe(OPTIMUM);
    expect(plan.optimal).toBe(true);
    expect(plan.gap).toBeCloseTo((OPTIMUM - LP_BOUND) / LP_BOUND, 6);
    // The LP optimum, its round-up ceil(452.25) = 453 rolls, and the plan 0 rolls above it.
    expect(plan.lp_value).toBeCloseTo(LP_BOUND, 6);
    expect(plan.lp_bound).toBe(Math.ceil(LP_BOUND));
    expect(plan.lp_gap).toBe(OPTIMUM - Math.ceil(LP_BOUND));
    expect(plan.cost).toBeNull();
    expect(plan.bought).toEqual([{ length_mm: 100, count: OPTIMUM, cost: null }]);
    expect(planProblems(CUTSTOCK, plan)).toEqual([]);
    // Waste: stock bought less the pieces cut (no kerf here).
    const pieces = CUTSTOCK.pieces.reduce((s, p) => s + p.length_mm * p.quantity, 0);
    expect(plan.waste_mm).toBeCloseTo(OPTIMUM * 100 - pieces, 6);
    expect(plan.waste_pct).toBeCloseTo((100 * (OPTIMUM * 100 - pieces)) / (OPTIMUM * 100), 4);
  });
});

it('first-fit decreasing alone does worse, and says it is not proved', () => {
  const plan = planCutting(CUTSTOCK, undefined);
  expect(plan.method).toBe('first-fit decreasing');
  // No solver, no LP: no LP bound is claimed.
  expect([plan.lp_value, plan.lp_bound, plan.lp_gap]).toEqual([null, null, null]);
  expect(plan.pieces_used).toBeGreaterThan(OPTIMUM);
  expect(plan.optimal).toBe(false);
  expect(planProblems(CUTSTOCK, plan)).toEqual([]);
  // With the solver, the baseline reported beside the plan is this same plan.
  expect(planCutting(CUTSTOCK, lp).baseline.pieces_used).toBe(plan.pieces_used);
});
