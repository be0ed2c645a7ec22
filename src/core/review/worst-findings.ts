import { severityRank, type Finding } from '../findings/finding.ts';

/** How many findings a review row shows for a proposal. */
export const WORST_SHOWN = 3;

/**
 * The worst graded findings: by severity, then by utilisation within a
 * severity (one without a utilisation after those with one), the check's own
 * order breaking ties. Notes (info) never count, so they are left out.
 */
export function worstFindings(findings: readonly Finding[], count = WORST_SHOWN): Finding[] {
  return findings
    .map((f, i) => ({ f, i }))
    .filter(({ f }) => f.severity !== 'info')
    .sort((a, b) => severityRank(b.f.severity) - severityRank(a.f.severity) || (b.f.utilisation ?? -1) - (a.f.utilisation ?? -1) || a.i - b.i)
    .slice(0, count)
    .map(({ f }) => f);
}
