// The stock planner's limits are counted in work, not time, so its plan
// depends on the input alone: the same plan twice in one process, and the
// same plan on an idle machine and on one loaded by a busy worker thread
// (which under a wall-clock limit stopped the search sooner). Compared byte
// for byte as JSON.
import { Worker } from 'node:worker_threads';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import type { CuttingInstance, LpSolver } from '../../src/core/stock/cutting-types.ts';
import { planCutting, type PlanOptions } from '../../src/core/stock/plan-cutting.ts';
import { planProblems } from '../../src/core/stock/validate-plan.ts';
import { seeded } from '../support/brute-force-cutting.ts';

// 120 items of Falkenauer's uniform class (sizes 20 to 100, bin 150; the
// class of the OR-Library u120 set), drawn from a fixed seed.
const rand = seeded(16);
const sizes = Array.from({ length: 120 }, () => 20 + Math.floor(rand() * 81));
const INSTANCE: CuttingInstance = { kerf_mm: 0, stock: [{ length_mm: 150 }], pieces: sizes.map((length_mm, k) => ({ length_mm, quantity: 1, label: `item ${k}` })) };
// Closed form: no packing uses fewer than ceil(sum / capacity) bins.
const LENGTH_BOUND = Math.ceil(sizes.reduce((s, x) => s + x, 0) / 150);

/** Work limits that bind: the dive stops after ten nodes, before it meets the bound, and no MIP runs. */
const TIGHT: PlanOptions = { work: { diveNodes: 10, mipNodes: 0 } };

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

/** A worker thread spinning until terminated: one core kept busy. */
async function whileBusy<T>(f: () => T): Promise<T> {
  const busy = new Worker('for (;;) {}', { eval: true });
  await new Promise((resolve) => busy.once('online', resolve));
  try {
    return f();
  } finally {
    await busy.terminate();
  }
}

describe('the stock plan depends on the input alone', () => {
  it('the instance needs the search: first-fit decreasing misses the length bound, the planner does not go below it', () => {
    const plan = planCutting(INSTANCE, lp);
    expect(planCutting(INSTANCE, undefined).pieces_used).toBeGreaterThan(LENGTH_BOUND);
    expect(plan.method).toMatch(/^column generation/);
    expect(plan.pieces_used).toBeGreaterThanOrEqual(LENGTH_BOUND);
    expect(planProblems(INSTANCE, plan)).toEqual([]);
    // The tight limits stop the search short of the default's plan, so the comparison below tests a stop.
    expect(planCutting(INSTANCE, lp, TIGHT).pieces_used).toBeGreaterThan(plan.pieces_used);
  });

  it.each([
    ['default limits', {}],
    ['limits that bind', TIGHT],
  ] as const)('%s: two runs in one process give the same plan', (_, opts) => {
    expect(JSON.stringify(planCutting(INSTANCE, lp, opts))).toBe(JSON.stringify(planCutting(INSTANCE, lp, opts)));
  });

  it.each([
    ['default limits', {}],
    ['limits that bind', TIGHT],
  ] as const)('%s: the same plan on an idle machine and under a busy worker thread', async (_, opts) => {
    const idle = JSON.stringify(planCutting(INSTANCE, lp, opts));
    const loaded = JSON.stringify(await whileBusy(() => planCutting(INSTANCE, lp, opts)));
    expect(loaded).toBe(idle);
    expect(planProblems(INSTANCE, JSON.parse(idle))).toEqual([]);
  });
});
