// Both exact methods, and the default plan of a small problem (the pattern
// search of small-plan.ts, no LP solver), against exhaustive search on small
// random instances (seeded, so the same every run) where first-fit
// decreasing alone misses the optimum: the same optimum, proved, a valid
// plan, a bound that does not exceed the optimum, and a shortfall where
// exhaustive search finds no plan.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { CuttingInstance, CuttingPlan, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting, type CuttingMethod } from '../../src/core/stock/plan-cutting.ts';
import { StockShortfallError } from '../../src/core/stock/stock-shortfall.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';
import { bruteForceOptimum, seeded } from '../support/brute-force-cutting.ts';
import { randomInstance } from '../support/random-cutting.ts';

const INSTANCES = 30;
const MAX_PIECES = 8;

/** What first-fit decreasing alone achieves; Infinity where it cannot keep within the stock available. */
function firstFitObjective(inst: CuttingInstance): number {
  try {
    const plan = planCutting(inst, undefined);
    return plan.cost ?? plan.pieces_used;
  } catch (e) {
    if (e instanceof StockShortfallError) return Infinity;
    throw e;
  }
}

// Kept only where first-fit decreasing misses the optimum, so every case
// needs the solver; and a few where no plan exists at all.
const rand = seeded(20240611);
const cases: { n: number; inst: CuttingInstance; optimum: number }[] = [];
const impossible: CuttingInstance[] = [];
for (let tries = 0; cases.length < INSTANCES && tries < 20_000; tries++) {
  const inst = randomInstance(rand, MAX_PIECES);
  const optimum = bruteForceOptimum(inst);
  if (optimum === Infinity) {
    if (impossible.length < 5) impossible.push(inst);
  } else if (firstFitObjective(inst) > optimum + 1e-9) cases.push({ n: cases.length, inst, optimum });
}

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

function expectOptimum(inst: CuttingInstance, plan: CuttingPlan, optimum: number): void {
  expect(planProblems(inst, plan)).toEqual([]);
  expect(plan.cost ?? plan.pieces_used).toBeCloseTo(optimum, 6);
  expect(plan.optimal).toBe(true);
  expect(plan.lower_bound).toBeLessThanOrEqual(optimum + 1e-6);
}

describe.each<CuttingMethod>(['column generation', 'arc flow'])('%s against exhaustive search', (method) => {
  it.each(cases)('random instance $n', ({ inst, optimum }) => {
    expectOptimum(inst, planCutting(inst, lp, { method }), optimum);
  });

  it('reports a shortfall where no plan exists', () => {
    for (const inst of impossible) expect(() => planCutting(inst, lp, { method })).toThrow(StockShortfallError);
  });
});

describe('the default plan of a small problem against exhaustive search', () => {
  it.each(cases)('random instance $n: the pattern search, with the pattern LP value of the LP solver', ({ inst, optimum }) => {
    const plan = planCutting(inst, lp);
    expectOptimum(inst, plan, optimum);
    expect(plan.method).toBe('pattern search, proved optimal');
    // The same LP (Gilmore and Gomory, Operations Research 9 (1961)) on the dense simplex as on the LP solver: the same optimum.
    const solver = planCutting(inst, lp, { method: 'column generation' });
    expect(plan.lp_value).toBeCloseTo(solver.lp_value!, 6);
    expect(plan.lp_bound).toBeCloseTo(solver.lp_bound!, 6);
  });

  it('reports a shortfall where no plan exists', () => {
    for (const inst of impossible) expect(() => planCutting(inst, lp)).toThrow(StockShortfallError);
  });
});

it('the random set is what it claims: 30 cases, priced and unpriced, limited stock, up to 8 pieces', () => {
  expect(cases).toHaveLength(INSTANCES);
  expect(impossible.length).toBeGreaterThan(0);
  expect(cases.some((c) => c.inst.stock.every((s) => s.cost !== undefined))).toBe(true);
  expect(cases.some((c) => c.inst.stock.every((s) => s.cost === undefined))).toBe(true);
  expect(cases.some((c) => c.inst.stock.some((s) => s.available !== undefined))).toBe(true);
  for (const c of cases) expect(c.inst.pieces.reduce((n, p) => n + p.quantity, 0)).toBeLessThanOrEqual(MAX_PIECES);
});
