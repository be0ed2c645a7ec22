import type { Finding } from '../findings/finding.ts';

/** How many of the highest utilisations a build without a warning or failure is explained by. */
export const TOP_PASSING = 3;

/** Every failing or warning finding; for a build with none, the three highest utilisations. */
export function decisiveFindings(findings: readonly Finding[]): Finding[] {
  const bad = findings.filter((f) => f.severity === 'fail' || f.severity === 'warning');
  if (bad.length) return bad;
  return findings
    .filter((f) => (f.severity === 'pass' || f.severity === 'advice') && f.utilisation !== null)
    .sort((a, b) => (b.utilisation ?? 0) - (a.utilisation ?? 0))
    .slice(0, TOP_PASSING);
}
