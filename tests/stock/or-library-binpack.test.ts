// The planner on the OR-Library bin-packing sets u120 and u250 (Falkenauer,
// Journal of Heuristics 2 (1996); J. E. Beasley's OR-Library), read from
// ../shared/data/ where present (never copied into the project): every plan
// valid item by item, at the optimum (corrected optima of
// ../shared/data/README.md), its LP bound at most the optimum, and the LP gap
// the plan's count less that bound.
import { beforeAll, describe, expect, it } from 'vitest';
import { asInstance } from '../../bench/bin-packing.ts';
import { hasOrLibrary, readOrLibrary } from '../../bench/or-library.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

describe.each(['orlib-binpack1.txt', 'orlib-binpack2.txt'])('%s', (file) => {
  const set = hasOrLibrary(file) ? readOrLibrary(file) : [];
  it.skipIf(set.length > 0)('is not in ../shared/data/ here; skipped', () => {
    expect(set).toEqual([]);
  });
  it.runIf(set.length > 0)('every instance planned at its optimum, with a valid plan and an LP bound not above it', () => {
    for (const b of set) {
      const inst = asInstance(b);
      const plan = planCutting(inst, lp);
      expect(planProblems(inst, plan), b.name).toEqual([]);
      expect(plan.pieces_used, b.name).toBe(b.target); // the optimum (Falkenauer 1996; README corrections)
      expect(plan.lp_bound, b.name).not.toBeNull();
      expect(plan.lp_bound!, b.name).toBeLessThanOrEqual(b.target);
      expect(plan.lp_gap, b.name).toBe(plan.pieces_used - plan.lp_bound!);
    }
  });
});
