import { say, type MessageKey } from '../diagnostics/messages.ts';
import type { Finding, Severity } from '../findings/finding.ts';

// Older rules build their findings whole through here while they move to
// defineRule; their messages come pre-formatted from the shared table.

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
  const lines = i.working === '' ? [] : i.working.split('\n');
  const working = [...lines, `source: ${i.source}`].map((formula) => ({ formula, substituted: '', result: null, unit: '' }));
  return {
    rule,
    code,
    severity: i.severity,
    subject: i.subject,
    subject_label: i.subject,
    message_key: i.message,
    params: i.params,
    message: text,
    value: i.value,
    unit: i.unit,
    limit: i.limit,
    utilisation,
    combination: null,
    load_case: null,
    fix: i.fix,
    sources: [],
    working,
    working_text: working.map((w) => w.formula).join('\n'),
  };
}

/** Severity of a value against an advisory and a hard upper limit; equal is within. */
export function gradeUpper(value: number, advisory: number, hard: number): Severity {
  if (value > hard) return 'fail';
  if (value > advisory) return 'warning';
  return 'pass';
}
