// Both exact methods against exhaustive search on small random instances
// (seeded, so the same every run) where first-fit decreasing alone misses
// the optimum: the same optimum, proved, a valid plan, a bound that does not
// exceed the optimum, and a shortfall where exhaustive search finds no plan.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { CuttingInstance, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting, type CuttingMethod } from '../../src/core/stock/plan-cutting.ts';
import { StockShortfallError } from '../../src/core/stock/stock-shortfall.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';
import { bruteForceOptimum, seeded } from '../support/brute-force-cutting.ts';

const INSTANCES = 30;
const MAX_PIECES = 8;

function randomInstance(rand: () => number): CuttingInstance {
  const int = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));
  const nStock = rand() < 0.6 ? 2 : 1;
  const priced = rand() < 0.6;
  const limited = rand() < 0.3;
  const lengths = [...new Set(Array.from({ length: nStock }, () => int(60, 200)))];
  const stock = lengths.map((length_mm) => ({
    length_mm,
    ...(priced ? { cost: int(5, 40) / 2 } : {}),
    ...(limited ? { available: int(1, 4) } : {}),
  }));
  const longest = Math.max(...lengths);
  const pieces: CuttingInstance['pieces'] = [];
  let total = int(1, MAX_PIECES);
  while (total > 0) {
    const quantity = int(1, total);
    // Pieces of a sixth to three fifths of the stock make packing matter.
    pieces.push({ length_mm: int(Math.round(longest / 6), Math.round((longest * 3) / 5)), quantity, label: `part ${pieces.length + 1}` });
    total -= quantity;
  }
  return { kerf_mm: int(0, 3), stock, pieces };
}

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
  const inst = randomInstance(rand);
  const optimum = bruteForceOptimum(inst);
  if (optimum === Infinity) {
    if (impossible.length < 5) impossible.push(inst);
  } else if (firstFitObjective(inst) > optimum + 1e-9) cases.push({ n: cases.length, inst, optimum });
}

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

describe.each<CuttingMethod>(['column generation', 'arc flow'])('%s against exhaustive search', (method) => {
  it.each(cases)('random instance $n', ({ inst, optimum }) => {
    const plan = planCutting(inst, lp, { method });
    expect(planProblems(inst, plan)).toEqual([]);
    expect(plan.cost ?? plan.pieces_used).toBeCloseTo(optimum, 6);
    expect(plan.optimal).toBe(true);
    expect(plan.lower_bound).toBeLessThanOrEqual(optimum + 1e-6);
  });

  it('reports a shortfall where no plan exists', () => {
    for (const inst of impossible) expect(() => planCutting(inst, lp, { method })).toThrow(StockShortfallError);
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
