import type { Finding } from '../findings/finding.ts';
import { severityRank, type Severity } from '../findings/severity.ts';
import type { CheckResult } from '../result/check-result.ts';
import type { FindingComparison } from './compare-result.ts';

/** A finding is the same finding in two builds when its rule and subject are. */
export const findingKey = (f: { rule: string; subject: string }): string => `${f.rule}|${f.subject}`;

/** The worst severity a comparison holds; a missing finding counts below every severity. */
export const worstOf = (c: Pick<FindingComparison, 'severities'>): number => Math.max(...c.severities.map((s) => (s === null ? -1 : severityRank(s))));

/**
 * Every finding across the builds, matched by rule and subject: those every
 * build has but at different severities, and those some builds lack. Worst
 * first, then in the baseline's order.
 */
export function compareFindings(results: readonly CheckResult[], titleOf: (rule: string) => string): { differing: FindingComparison[]; notInAll: FindingComparison[] } {
  const maps = results.map((r) => new Map(r.findings.map((f) => [findingKey(f), f])));
  const keys: string[] = [];
  for (const m of maps) for (const k of m.keys()) if (!keys.includes(k)) keys.push(k);
  const all = keys.map((k) => comparison(maps.map((m) => m.get(k) ?? null), titleOf));
  const byWorst = (list: FindingComparison[]) => list.map((c, i) => ({ c, i })).sort((x, y) => worstOf(y.c) - worstOf(x.c) || x.i - y.i).map((x) => x.c);
  return {
    differing: byWorst(all.filter((c) => c.severities.every((s) => s !== null) && new Set(c.severities).size > 1)),
    notInAll: byWorst(all.filter((c) => c.severities.some((s) => s === null))),
  };
}

function comparison(found: (Finding | null)[], titleOf: (rule: string) => string): FindingComparison {
  const any = found.find((f): f is Finding => f !== null)!;
  return {
    rule: any.rule,
    title: titleOf(any.rule),
    subject: any.subject,
    subject_label: any.subject_label,
    severities: found.map((f): Severity | null => f?.severity ?? null),
    values: found.map((f) => (f && f.value !== null && Number.isFinite(f.value) ? f.value : null)),
    unit: any.unit,
    messages: found.map((f) => f?.message ?? null),
  };
}
