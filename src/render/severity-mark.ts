import { SEVERITIES, type Severity } from '../core/findings/finding.ts';

/**
 * How a severity is written in the Markdown report: the word, in capitals, in
 * bold. The HTML renderer turns exactly this into a coloured badge that keeps
 * the word; escaped user text can never produce it.
 */
export function severityMark(severity: Severity): string {
  return `**${severity.toUpperCase()}**`;
}

/** The severity whose bold word this is, if any. */
export function severityOfMarkText(text: string): Severity | undefined {
  return SEVERITIES.find((s) => s.toUpperCase() === text);
}
