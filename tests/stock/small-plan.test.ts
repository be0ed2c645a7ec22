// The parts of the small-problem plan (src/core/stock/small-plan.ts) on their
// own: the exact pattern search against exhaustive search (written apart
// from the planner, tests/support/brute-force-cutting.ts) on seeded tiny
// instances, whether first-fit meets the optimum or not; the pattern LP on
// the dense simplex against the textbook value and against the LP solver;
// how ties fall; and where the search gives way to the LP solver.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { binsObjective } from '../../src/core/stock/bin.ts';
import { patternLpBound } from '../../src/core/stock/column-generation.ts';
import { prepareProblem } from '../../src/core/stock/cutting-problem.ts';
import type { CuttingInstance, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { patternSearch, PATTERN_SEARCH_MAX_PIECES, PATTERN_SEARCH_MAX_STATES, searchable } from '../../src/core/stock/pattern-search.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { smallPatternLp } from '../../src/core/stock/small-pattern-lp.ts';
import { WorkMeter } from '../../src/core/stock/work-meter.ts';
import { bruteForceOptimum, seeded } from '../support/brute-force-cutting.ts';
import { randomInstance } from '../support/random-cutting.ts';
import { CUTSTOCK, LP_BOUND } from '../support/textbook-cutstock.ts';

const rand = seeded(16_3);
const instances = Array.from({ length: 80 }, () => randomInstance(rand, 10));

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

describe('the pattern search against exhaustive search', () => {
  it.each(instances.map((inst, n) => ({ n, inst })))('random instance $n: the same least objective, or none where no plan exists', ({ inst }) => {
    const p = prepareProblem(inst);
    const bins = patternSearch(p);
    const optimum = bruteForceOptimum(inst);
    if (optimum === Infinity) expect(bins).toBeNull();
    else expect(binsObjective(p, bins!)).toBeCloseTo(optimum, 6);
  });

  it('the set holds plans and impossible cases, limited stock and both objectives', () => {
    const optima = instances.map(bruteForceOptimum);
    expect(optima.filter((o) => o === Infinity).length).toBeGreaterThan(0);
    expect(optima.filter((o) => o < Infinity).length).toBeGreaterThan(40);
    expect(instances.some((i) => i.stock.some((s) => s.available !== undefined))).toBe(true);
    expect(instances.some((i) => i.stock.every((s) => s.cost !== undefined))).toBe(true);
    expect(instances.some((i) => i.stock.every((s) => s.cost === undefined))).toBe(true);
  });
});

describe('the pattern LP on the dense simplex', () => {
  it('CUTSTOCK: the published LP value 452.25 rolls', () => {
    // Gilmore & Gomory, Operations Research 9 (1961), as the GAMS model library's CUTSTOCK (tests/support/textbook-cutstock.ts).
    expect(smallPatternLp(prepareProblem(CUTSTOCK), null, new WorkMeter())).toBeCloseTo(LP_BOUND, 9);
    expect(LP_BOUND).toBe(452.25);
  });

  it.each(instances.map((inst, n) => ({ n, inst })))('random instance $n: the LP solver finds the same optimum', ({ inst }) => {
    const p = prepareProblem(inst);
    const theirs = patternLpBound(p, lp, new WorkMeter(), null);
    expect(smallPatternLp(p, null, new WorkMeter())).toBeCloseTo(theirs!, 6);
  });
});

describe('ties', () => {
  // 2 x 500 mm, no kerf, from 1000 mm at 10 or 500 mm at 5: one long piece or two short ones cost 10 alike.
  const inst: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 500, cost: 5 }, { length_mm: 1000, cost: 10 }], pieces: [{ length_mm: 500, quantity: 2 }] };

  it('at the same cost, fewer stock pieces', () => {
    const p = prepareProblem(inst);
    expect(patternSearch(p)).toEqual([{ stock: 1, items: [0, 0] }]);
  });

  it('the same plan, byte for byte, every time', () => {
    expect(JSON.stringify(planCutting(inst, lp))).toBe(JSON.stringify(planCutting(inst, lp)));
  });
});

describe('where the search gives way to the LP solver', () => {
  // Residual demands run 0..quantity: (quantity + 1) states per piece length.
  const two = (a: number, b: number): CuttingInstance => ({
    kerf_mm: 0,
    stock: [{ length_mm: 100 }],
    pieces: [
      { length_mm: 20, quantity: a },
      { length_mm: 10, quantity: b },
    ],
  });

  it('a memo of exactly the state limit is searched, a bigger one is not', () => {
    expect(PATTERN_SEARCH_MAX_STATES).toBe(250 * 400);
    expect(searchable(prepareProblem(two(249, 399)))).toBe(true);
    expect(searchable(prepareProblem(two(249, 400)))).toBe(false);
  });

  it('exactly the piece limit is searched, one piece more is not', () => {
    expect(searchable(prepareProblem(two(0, PATTERN_SEARCH_MAX_PIECES)))).toBe(true);
    expect(searchable(prepareProblem(two(1, PATTERN_SEARCH_MAX_PIECES)))).toBe(false);
  });

  it('a bigger problem is planned by column generation', () => {
    // 24 lengths wanted twice each: 3^24 residual states, far beyond the limit.
    const inst: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 150 }], pieces: Array.from({ length: 24 }, (_, k) => ({ length_mm: 30 + 3 * k, quantity: 2 })) };
    expect(searchable(prepareProblem(inst))).toBe(false);
    expect(planCutting(inst, lp).method).toMatch(/^(column generation|first-fit decreasing)/);
  });
});
