import { CAUTIONS } from '../cautions.ts';
import type { RulesData } from '../data/rules-data.ts';
import { SEVERITIES, type Severity } from '../findings/severity.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import type { CompareResult, ComparedBuild } from './compare-result.ts';
import { compareFigures } from './figure-diff.ts';
import { compareFindings } from './finding-diff.ts';
import { diffSpecs } from './spec-diff.ts';
import { pairAccount, type ComparedSpec } from './pair-account.ts';

export interface CompareArgs {
  /** The builds as checked, the baseline first; each with the file it came from. */
  builds: readonly (ComparedSpec & { file: string })[];
  data: RulesData;
  inputs: Omit<ModelInputs, 'spec' | 'data'>;
  rules: readonly Rule[];
  /** Called after each other build's account, for progress. */
  onAccount?: (done: number) => void;
}

function countsOf(severities: readonly Severity[]): Record<Severity, number> {
  const counts = Object.fromEntries(SEVERITIES.map((s) => [s, 0])) as Record<Severity, number>;
  for (const s of severities) counts[s]++;
  return counts;
}

/**
 * Builds checked the same way, side by side: every figure with its
 * difference and ratio against the baseline, the findings that differ, each
 * build's decisive inputs, and for each other build the account of why its
 * verdict differs from the baseline's. Pure: the checks are run by the caller.
 */
export function compareBuilds(a: CompareArgs): CompareResult {
  const [base] = a.builds;
  const results = a.builds.map((b) => b.result);
  const title = new Map(a.rules.map((r) => [r.id, r.title]));
  const { differing, notInAll } = compareFindings(results, (id) => title.get(id) ?? id);
  const builds: ComparedBuild[] = a.builds.map((b) => ({ label: b.label, file: b.file, spec_name: b.result.spec_name, verdict: b.result.verdict, counts: countsOf(b.result.findings.map((f) => f.severity)) }));
  const accounts = a.builds.slice(1).map((other, i) => {
    const account = pairAccount({ base, other, data: a.data, inputs: a.inputs, rules: a.rules });
    a.onAccount?.(i + 1);
    return account;
  });
  return {
    tool: base.result.tool,
    builds,
    figures: compareFigures(results),
    findings_differing: differing,
    findings_not_in_all: notInAll,
    decisive_inputs: results.map((r) => r.decisive_inputs ?? null),
    spec_differences: diffSpecs(a.builds.map((b) => b.spec)),
    accounts,
    cautions: [...CAUTIONS],
  };
}
