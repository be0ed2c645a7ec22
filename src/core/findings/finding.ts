export const SEVERITIES = ['pass', 'advice', 'warning', 'fail'] as const;
export type Severity = (typeof SEVERITIES)[number];

export function severityRank(s: Severity): number {
  return SEVERITIES.indexOf(s);
}

export function worstSeverity(list: readonly Severity[]): Severity {
  return list.reduce<Severity>((w, s) => (severityRank(s) > severityRank(w) ? s : w), 'pass');
}

/** One result of one rule for one subject, with everything needed to audit it. */
export interface Finding {
  rule: string;
  /** Stable message code from the diagnostics table. */
  code: number;
  severity: Severity;
  /** The part or load case the finding is about. */
  subject: string;
  value: number | null;
  unit: string;
  limit: number | null;
  /** value / limit, where both exist. */
  utilisation: number | null;
  message: string;
  fix: string;
  source: string;
  /** The formula with the numbers substituted, one step per line. */
  working: string;
}
