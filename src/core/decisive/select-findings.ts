import type { Finding } from '../findings/finding.ts';
import type { Rule } from '../pipeline/define-rule.ts';

/** How many of the highest utilisations a build without a warning or failure is explained by. */
export const TOP_PASSING = 3;

/**
 * Every failing or warning finding; for a build with none, the three highest utilisations. Findings of a check of
 * the model's own arithmetic (`ofTheModel`: a solver's residual against its tolerance) are left out: no input of
 * the build moves them to a verdict, and a residual near its tolerance would crowd out the build's real margins.
 */
export function decisiveFindings(all: readonly Finding[], rules: readonly Pick<Rule, 'id' | 'ofTheModel'>[]): Finding[] {
  const ofTheModel = new Set(rules.filter((r) => r.ofTheModel).map((r) => r.id));
  const findings = all.filter((f) => !ofTheModel.has(f.rule));
  const bad = findings.filter((f) => f.severity === 'fail' || f.severity === 'warning');
  if (bad.length) return bad;
  return findings
    .filter((f) => (f.severity === 'pass' || f.severity === 'advice') && f.utilisation !== null)
    .sort((a, b) => (b.utilisation ?? 0) - (a.utilisation ?? 0))
    .slice(0, TOP_PASSING);
}
