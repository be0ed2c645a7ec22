import { SEVERITIES, severityRank, type Finding, type Severity } from '../core/findings/finding.ts';

/** Severities from worst to best, the order every report lists them in. */
export const SEVERITIES_WORST_FIRST: readonly Severity[] = [...SEVERITIES].reverse();

/** The severities that grade a build, worst first: all but info, which only informs. */
export const GRADED_WORST_FIRST: readonly Severity[] = SEVERITIES_WORST_FIRST.filter((s) => s !== 'info');

/** A copy of the findings, worst first; the core's order is kept within a severity. */
export function findingsWorstFirst(findings: readonly Finding[]): Finding[] {
  return findings
    .map((finding, index) => ({ finding, index }))
    .sort((a, b) => severityRank(b.finding.severity) - severityRank(a.finding.severity) || a.index - b.index)
    .map(({ finding }) => finding);
}

export function countBySeverity(findings: readonly Finding[]): Record<Severity, number> {
  const counts = Object.fromEntries(SEVERITIES.map((s) => [s, 0])) as Record<Severity, number>;
  for (const f of findings) counts[f.severity] += 1;
  return counts;
}
