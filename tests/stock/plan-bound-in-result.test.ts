// The LP bound and gap of every stock plan reach the check result (and so
// its JSON): on the demo with listed stock, each group planned with the
// solver carries lp_value, lp_bound (lp_value rounded up to the objective's
// step, here checked against the plain ceiling where the stock is counted)
// and lp_gap, the plan's objective less that bound.
import { beforeAll, expect, it } from 'vitest';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import type { LpSolver } from '../../src/core/stock/cutting-types.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

it('each group of the demo with stock carries its LP bound and gap into the result JSON', () => {
  const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  const json = JSON.parse(JSON.stringify(runCheck(p.spec, p.entries, rulesData, { lp })));
  const groups: { plan: { cost: number | null; pieces_used: number; lower_bound: number; lp_value: number; lp_bound: number; lp_gap: number } }[] = json.cutting.stock_plan.groups;
  expect(groups.length).toBeGreaterThan(0);
  for (const { plan } of groups) {
    const objective = plan.cost ?? plan.pieces_used;
    expect(typeof plan.lp_value).toBe('number');
    expect(plan.lp_bound).toBeGreaterThanOrEqual(plan.lp_value - 1e-9);
    if (plan.cost === null) expect(plan.lp_bound).toBe(Math.ceil(plan.lp_value - 1e-7)); // whole stock pieces
    expect(plan.lp_gap).toBeCloseTo(objective - plan.lp_bound, 6);
    expect(plan.lp_gap).toBeGreaterThanOrEqual(-1e-9); // no plan beats its LP bound
    expect(plan.lower_bound).toBeGreaterThanOrEqual(plan.lp_value - 1e-9);
  }
});
