// The planner when the LP solver fails inside (an unsolved model, a time limit
// hit between adding a column and reading the values): first-fit decreasing
// stands, with a note in the method, never a crash; the first-fit room tree
// against a plain scan; the piece-count limit of `axletree stock`.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { CuttingInstance, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';
import { FirstRoom } from '../../src/core/stock/first-room.ts';
import { checkCuttingInstance, MAX_PIECES } from '../../src/core/stock/check-instance.ts';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

/** The real solver whose models throw as HiGHS does when asked for a solution it has not got. */
function failing(real: LpSolver): LpSolver {
  return Object.assign(Object.create(real) as LpSolver, {
    createModel: () => {
      throw new Error('The model has not been solved');
    },
  });
}

// First-fit decreasing does not meet the length bound here, so the exact method runs:
// 4 x 600 and 4 x 450 mm from 1000 mm stock, no kerf. By length 4200 / 1000 needs 5 pieces;
// first-fit puts 600 alone (a 450 does not fit beside it) and pairs the 450s: 4 + 2 = 6.
const INSTANCE: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 1000 }], pieces: [{ length_mm: 600, quantity: 4 }, { length_mm: 450, quantity: 4 }] };

describe('a solver that fails', () => {
  // Asked for by name: left to the default, a problem this small is planned without the LP solver (small-plan.ts).
  it('leaves the first-fit plan, saying why, and the plan is sound', () => {
    const plan = planCutting(INSTANCE, failing(lp), { method: 'column generation' });
    expect(planProblems(INSTANCE, plan)).toEqual([]);
    expect(plan.method).toMatch(/^first-fit decreasing \(the LP solver failed: The model has not been solved\)/);
    expect(plan.pieces_used).toBe(6);
    // The bound falls back to the stock length: 4200 / 1000.
    expect(plan.lower_bound).toBeCloseTo(4.2, 9);
  });

  it('by default a problem this small never reaches the solver, and is planned the same as with it', () => {
    const plan = planCutting(INSTANCE, failing(lp));
    expect(planProblems(INSTANCE, plan)).toEqual([]);
    expect(plan.pieces_used).toBe(6);
    // The pattern LP: each 600 on its own piece (4), the 450s two to a piece (2), so 6 = the plan, proved.
    expect(plan.lp_value).toBeCloseTo(6, 9);
    expect(plan.optimal).toBe(true);
  });

  it('with the real solver the same instance is planned as before', () => {
    const plan = planCutting(INSTANCE, lp);
    expect(planProblems(INSTANCE, plan)).toEqual([]);
    expect(plan.pieces_used).toBe(6); // each 600 needs its own piece: 4, and 4 x 450 two to a piece: 2
  });
});

describe('FirstRoom', () => {
  it('finds the first piece with room, as a scan would', () => {
    const rooms = [5, 3, 9, 2, 9, 7];
    const t = new FirstRoom(8);
    rooms.forEach((r) => t.push(r));
    for (const want of [0, 3, 4, 6, 8, 9, 10]) expect(t.first(want)).toBe(rooms.findIndex((r) => r >= want));
    t.set(2, 1);
    expect(t.first(8)).toBe(4);
    expect(t.get(2)).toBe(1);
  });
});

describe('the piece-count limit', () => {
  it(`refuses more than ${MAX_PIECES} pieces in one plan, naming the count`, () => {
    const r = checkCuttingInstance({ kerf_mm: 3, stock: [{ length_mm: 3000 }], pieces: Array.from({ length: 10 }, (_, i) => ({ length_mm: 100 + i, quantity: 100_000 })) });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.message)).toEqual([`the pieces to cut total 1000000; allowed: at most ${MAX_PIECES} in one plan (plan the job in parts).`]);
  });
});
