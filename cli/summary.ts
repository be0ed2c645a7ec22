import type { CheckResult } from '../src/core/result/check-result.ts';
import { SEVERITIES } from '../src/core/findings/finding.ts';
import { SHORT_CAUTION } from '../src/core/cautions.ts';

/** The terminal summary: verdict, counts, the worst findings, where files went. */
export function summary(result: CheckResult, written: string[], show = 6): string {
  const counts = SEVERITIES.map((s) => `${result.findings.filter((f) => f.severity === s).length} ${s}`).join(', ');
  // Notes (info) inform; the worst graded findings come first in the result.
  const worst = result.findings.filter((f) => f.severity !== 'pass' && f.severity !== 'info').slice(0, show);
  const lines = [
    `${result.spec_name}`,
    `verdict: ${result.verdict.toUpperCase()}  (${counts})`,
    `  ${result.verdict}: ${result.severity_meanings[result.verdict]}`,
    ...result.provisional.map((r) => `  provisional: ${r}`),
    ...worst.map((f) => `  ${f.severity.padEnd(7)} ${f.rule}  ${f.message}`),
    ...(written.length ? ['written:', ...written.map((w) => `  ${w}`)] : []),
    SHORT_CAUTION,
  ];
  return lines.join('\n') + '\n';
}
