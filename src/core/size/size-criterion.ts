import type { Finding, Severity } from '../findings/finding.ts';
import { severityRank } from '../findings/severity.ts';

// When a changed build "passes every check" for the sizing: the findings of
// the rule being satisfied all pass, and no other finding is worse than in
// the build as given. Worse is a higher severity; a finding already beyond a
// limit whose utilisation rises is reported beside the option, not refused
// (a heavier part loads the horses a little more, and a build that already
// fails elsewhere would otherwise admit no change at all).

export const CRITERION_TEXT =
  "a proposal passes when every finding of the rule it answers is pass or advice (notes aside) and no other finding's severity is worse than in the build as given (pass < advice < warning < fail < error; a finding the build as given did not have is compared with the worst of its rule there, or with pass); a finding that already warned or failed and whose utilisation rises by more than a hundredth is listed beside the proposal, not counted against it";

/** A finding that is worse, or whose utilisation rose, with the change. */
export interface FindingChange {
  rule: string;
  subject: string;
  label: string;
  from: Severity;
  to: Severity;
  from_utilisation: number | null;
  to_utilisation: number | null;
}

export interface Judgement {
  /** Every finding of the answered rule passes. */
  answered: boolean;
  /** Findings of other rules with a worse severity than in the build as given. */
  worse: FindingChange[];
  /** Findings already warning or failing whose utilisation rose by more than RISE. */
  risen: FindingChange[];
}

export const RISE = 0.01;

const PASSING: readonly Severity[] = ['pass', 'advice', 'info'];
export const passing = (s: Severity) => PASSING.includes(s);
const key = (f: { rule: string; subject: string }) => `${f.rule}|${f.subject}`;

export function judge(base: readonly Finding[], now: readonly Finding[], rule: string): Judgement {
  const was = new Map(base.map((f) => [key(f), f]));
  const worstOf = (r: string): Severity => base.filter((f) => f.rule === r).reduce<Severity>((w, f) => (severityRank(f.severity) > severityRank(w) ? f.severity : w), 'pass');
  const worse: FindingChange[] = [];
  const risen: FindingChange[] = [];
  for (const f of now) {
    if (f.rule === rule) continue;
    const b = was.get(key(f));
    const from = b?.severity ?? worstOf(f.rule);
    const change = { rule: f.rule, subject: f.subject, label: f.subject_label, from, to: f.severity, from_utilisation: b?.utilisation ?? null, to_utilisation: f.utilisation };
    if (severityRank(f.severity) > severityRank(from)) worse.push(change);
    else if (b && !passing(b.severity) && b.utilisation !== null && f.utilisation !== null && f.utilisation > b.utilisation * (1 + RISE)) risen.push(change);
  }
  return { answered: now.filter((f) => f.rule === rule).every((f) => passing(f.severity)), worse, risen };
}

/** Only the answered rule's findings pass (the quick test, before the whole check). */
export function rulePasses(findings: readonly Finding[], rule: string): boolean {
  return findings.filter((f) => f.rule === rule).every((f) => passing(f.severity));
}
