// Severities, and which of them make the verdict. A check gives pass,
// advice, warning or fail; a note informs (info) and never counts; error
// marks a rule that could not run (a fault in the tool), which makes the
// whole check incomplete.

/** The severities a verdict is made of, best first. */
export const VERDICT_SEVERITIES = ['pass', 'advice', 'warning', 'fail'] as const;
/** Every severity a finding can carry, in the order a report lists them worst last. */
export const SEVERITIES = ['info', 'pass', 'advice', 'warning', 'fail', 'error'] as const;

export type Severity = (typeof SEVERITIES)[number];
export type VerdictSeverity = (typeof VERDICT_SEVERITIES)[number];
export type Verdict = VerdictSeverity | 'error';

/** What each severity means, in one line each; every output prints these. */
export const SEVERITY_MEANING: Readonly<Record<Severity, string>> = {
  pass: 'within every limit the rule checks',
  advice: 'within the limits, but something should be confirmed or done (an input is missing, or a value is close to a limit)',
  warning: 'beyond an advisory limit but within the hard one: look again before building',
  fail: 'beyond a hard limit, or the check could not show the part is safe: do not build it this way',
  info: 'a note that informs; it never changes the verdict',
  error: 'the rule could not run (a fault in the tool, not in the build): the check is incomplete',
};

export function severityRank(s: Severity): number {
  return SEVERITIES.indexOf(s);
}

/** The verdict of a set of severities: the worst of them, info left out; error above all. */
export function verdictOf(list: readonly Severity[]): Verdict {
  let worst: Verdict = 'pass';
  for (const s of list) {
    if (s === 'info') continue;
    if (severityRank(s) > severityRank(worst)) worst = s;
  }
  return worst;
}
