import type { Finding } from '../findings/finding.ts';
import { severityRank } from '../findings/severity.ts';
import type { CheckResult } from '../result/check-result.ts';
import { findingKey } from './finding-diff.ts';

/** One finding in the baseline and in the other build; null where a build has no such finding. */
export interface FindingPair {
  base: Finding | null;
  other: Finding | null;
}

const rankOf = (f: Finding | null) => (f === null ? -1 : severityRank(f.severity));
const worst = (p: FindingPair) => Math.max(rankOf(p.base), rankOf(p.other));

/**
 * The findings that decide the difference between two builds' verdicts: of
 * the findings whose severity differs (or that one build lacks), those at the
 * worst severity either build gives them, if that is worse than a pass (a
 * pass against no finding, or a note, decides nothing). Where the verdicts
 * differ these are the findings that set the worse verdict. In the worse
 * build's order of findings.
 */
export function decidingFindings(base: CheckResult, other: CheckResult): FindingPair[] {
  const inBase = new Map(base.findings.map((f) => [findingKey(f), f]));
  const inOther = new Map(other.findings.map((f) => [findingKey(f), f]));
  const pairs: FindingPair[] = [];
  for (const f of other.findings) pairs.push({ base: inBase.get(findingKey(f)) ?? null, other: f });
  for (const f of base.findings) if (!inOther.has(findingKey(f))) pairs.push({ base: f, other: null });
  const differing = pairs.filter((p) => rankOf(p.base) !== rankOf(p.other) && worst(p) > severityRank('pass'));
  const top = Math.max(-1, ...differing.map(worst));
  return differing.filter((p) => worst(p) === top);
}
