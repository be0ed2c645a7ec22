import { say, type MessageKey } from '../diagnostics/messages.ts';
import type { Finding, Severity } from '../findings/finding.ts';

export interface FindingInput {
  severity: Severity;
  subject: string;
  value: number | null;
  unit: string;
  limit: number | null;
  message: MessageKey;
  params: Record<string, string | number>;
  fix: string;
  source: string;
  working: string;
}

export function makeFinding(rule: string, i: FindingInput): Finding {
  const { code, text } = say(i.message, i.params);
  const utilisation = i.value !== null && i.limit !== null && i.limit !== 0 ? i.value / i.limit : null;
  return { rule, code, severity: i.severity, subject: i.subject, value: i.value, unit: i.unit, limit: i.limit, utilisation, message: text, fix: i.fix, source: i.source, working: i.working };
}

/** Severity of a value against an advisory and a hard upper limit; equal is within. */
export function gradeUpper(value: number, advisory: number, hard: number): Severity {
  if (value > hard) return 'fail';
  if (value > advisory) return 'warning';
  return 'pass';
}
