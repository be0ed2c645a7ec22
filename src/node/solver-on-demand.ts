import type { RulesData } from '../core/data/rules-data.ts';
import { checkModels, checkWith, type RunOptions } from '../core/pipeline/run-check.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import type { SpecEntry } from '../core/spec/spec-entry.ts';
import type { CheckedSpecification } from '../core/spec/spec.types.ts';
import type { LpSolver } from '../core/stock/cutting-types.ts';
import { loadLpSolver } from './load-lp-solver.ts';

// A chariot's cut list is planned without the LP solver (an exact small
// search), so most checks never need HiGHS: loading it costs about 50 ms and
// 20 MB. The stock plan, the only model that calls the solver, is made first
// with a stand-in that notes any call and refuses it; only where the planner
// reached for the solver is HiGHS loaded and the check made with it from the
// start, so the result is the one the solver gives and nothing else (the
// decisive-input search least of all) runs twice.

/** A stand-in for the solver: every call is noted and refused. */
export function solverProbe(): { lp: LpSolver; used(): boolean } {
  let used = false;
  const lp = new Proxy({} as LpSolver, {
    get: (_, key) => {
      // Not a thenable, and not a method for anything that asks about symbols.
      if (key === 'then' || typeof key === 'symbol') return undefined;
      return () => {
        used = true;
        throw new Error('the LP solver is not loaded');
      };
    },
  });
  return { lp, used: () => used };
}

/** The check, with HiGHS loaded only if the stock plan needs it. */
export async function checkLoadingSolver(spec: CheckedSpecification, entries: SpecEntry[], data: RulesData, options: Omit<RunOptions, 'lp'> = {}): Promise<CheckResult> {
  const probe = solverProbe();
  const tried = checkModels(spec, data, { ...options, lp: probe.lp });
  tried.get('cutting');
  if (!probe.used()) return checkWith(tried, spec, entries, data, options);
  return checkWith(checkModels(spec, data, { ...options, lp: await loadLpSolver() }), spec, entries, data, options);
}
