import type { RulesData } from '../data/rules-data.ts';
import { decisiveInputs } from '../decisive/decisive-inputs.ts';
import { decisiveFindings } from '../decisive/select-findings.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import { MODELS } from '../pipeline/models.ts';
import { runCheck } from '../pipeline/run-check.ts';
import { runRules } from '../pipeline/run-rules.ts';
import type { CheckResult } from '../result/check-result.ts';
import { RULES } from '../rules/index.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LpSolver } from '../stock/cutting-types.ts';

export interface LimitedCheckOptions {
  lp?: LpSolver;
  /** The decisive-input search's work limit (decisive-inputs.ts WORK_LIMIT for a single check). */
  workLimit: number;
}

/**
 * The whole check with the decisive-input search held to a smaller work
 * limit, for a batch that must finish in seconds. runCheck does not take a
 * work limit yet, so the search runs here after a check without it, seeded
 * with the models the decisive findings' rules read (computed once more; it
 * is a small part of the search's cost). The answer is what runCheck would
 * give with the same limit; once RunOptions carries the limit this is one
 * runCheck call.
 */
export function checkWithWorkLimit(spec: CheckedSpecification, entries: SpecEntry[], data: RulesData, o: LimitedCheckOptions): CheckResult {
  const inputs = { lp: o.lp, ride: true };
  const result = runCheck(spec, entries, data, { lp: o.lp, decisive: false });
  const ids = new Set(decisiveFindings(result.findings).map((f) => f.rule));
  const rules = RULES.filter((r) => ids.has(r.id));
  const graph = new ModelGraph(MODELS, { spec, data, ...inputs });
  runRules(rules, spec, data, graph);
  const d = decisiveInputs({ spec, entries, data, rules: RULES, findings: result.findings, computed: graph.values(), inputs, workLimit: o.workLimit });
  // In runCheck's place, after the findings, so result.json reads the same as a single check's.
  const entriesOf = Object.entries(result).flatMap(([k, v]) => (k === 'findings' ? [[k, v], ['decisive_inputs', d.inputs], ['decisive_search', d.search]] : [[k, v]]));
  return Object.fromEntries(entriesOf) as CheckResult;
}
