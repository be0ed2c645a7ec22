// Plan validation finds each way a plan can be broken. The plan under test is
// a sound first-fit plan, then broken one way at a time.
import { describe, expect, it } from 'vitest';
import type { CuttingInstance, CuttingPlan } from '../../src/core/stock/cutting-types.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';

// 2 x 1200 + 1 x 500 mm with a 4 mm kerf from 3000 mm stock, price 12:
// 1200 + 1200 + 500 + 2 x 4 = 2908 <= 3000, one stock piece, offcut
// 3000 - 2900 - 3 x 4 = 88.
const INSTANCE: CuttingInstance = {
  kerf_mm: 4,
  stock: [{ length_mm: 3000, cost: 12, available: 1 }],
  pieces: [
    { length_mm: 1200, quantity: 2, label: 'rail' },
    { length_mm: 500, quantity: 1, label: 'cross-bar' },
  ],
};
const SOUND = planCutting(INSTANCE, undefined);

function broken(change: (plan: CuttingPlan) => void): string[] {
  const plan = structuredClone(SOUND);
  change(plan);
  return planProblems(INSTANCE, plan);
}

describe('plan validation', () => {
  it('passes the sound plan, worked by hand', () => {
    expect(SOUND.patterns).toEqual([
      {
        stock_length_mm: 3000,
        count: 1,
        cuts: [
          { label: 'rail', length_mm: 1200 },
          { label: 'rail', length_mm: 1200 },
          { label: 'cross-bar', length_mm: 500 },
        ],
        offcut_mm: 88,
      },
    ]);
    expect(planProblems(INSTANCE, SOUND)).toEqual([]);
  });

  it('finds a piece not cut', () => {
    expect(broken((p) => p.patterns[0].cuts.pop())).toEqual(expect.arrayContaining([expect.stringMatching(/cross-bar.*1 too few/)]));
  });

  it('finds cuts that overrun the stock with their kerfs', () => {
    expect(broken((p) => p.patterns[0].cuts.push({ label: 'cross-bar', length_mm: 500 }))).toEqual(expect.arrayContaining([expect.stringMatching(/exceed the stock/), expect.stringMatching(/1 too many/)]));
  });

  it('finds stock used beyond what is available, and totals that disagree', () => {
    const problems = broken((p) => (p.patterns[0].count = 2));
    expect(problems).toEqual(expect.arrayContaining([expect.stringMatching(/2 used, only 1 available/), expect.stringMatching(/pieces_used 1, but the patterns use 2/), expect.stringMatching(/cost 12, but the patterns cost 24/)]));
  });

  it('finds a wrong offcut, a stock length not listed, and cuts out of order', () => {
    expect(broken((p) => (p.patterns[0].offcut_mm = 100))).toEqual([expect.stringMatching(/offcut 100 mm, should be 88 mm/)]);
    expect(broken((p) => (p.patterns[0].stock_length_mm = 6000))).toEqual(expect.arrayContaining([expect.stringMatching(/no stock of that length is listed/)]));
    expect(broken((p) => p.patterns[0].cuts.reverse())).toEqual([expect.stringMatching(/not in cutting order/)]);
  });

  it('finds a label the instance does not ask for, and a bound above the plan', () => {
    expect(broken((p) => (p.patterns[0].cuts[0].label = 'pole'))).toEqual(expect.arrayContaining([expect.stringMatching(/"pole".*does not ask for/)]));
    expect(broken((p) => (p.lower_bound = 13))).toEqual([expect.stringMatching(/lower bound 13 is above/)]);
  });
});
