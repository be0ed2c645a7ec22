// A demo checked as `axletree check` checks it: the stock planner's solver,
// the decisive-input search, and the specification as read, so the result
// workbook carries its fill-in sheets.
import type { CheckResult } from '../../src/core/result/check-result.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

export async function demoResult(name: string): Promise<CheckResult> {
  const raw = readDemo(name);
  const p = prepareSpec(raw, rulesData);
  if (!p.ok) throw new Error(`${name} does not prepare`);
  const result = runCheck(p.spec, p.entries, rulesData, { lp: await loadLpSolver(), decisive: true });
  result.input = raw;
  return result;
}
