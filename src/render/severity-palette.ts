import type { Severity } from '../core/findings/finding.ts';

/**
 * Our own plain colour choice for severities, shared by the workbook fills and
 * the HTML badges so both outputs agree. Text colour is chosen for contrast;
 * colour is never the only signal, the word is always shown beside it.
 */
export const SEVERITY_COLOURS: Record<Severity, { fill: string; text: string }> = {
  fail: { fill: '#E06666', text: '#000000' },
  warning: { fill: '#FFC000', text: '#000000' },
  advice: { fill: '#BDD7EE', text: '#000000' },
  pass: { fill: '#C6EFCE', text: '#000000' },
  info: { fill: '#E7E6E6', text: '#000000' },
  error: { fill: '#7F7F7F', text: '#FFFFFF' },
};

/** '#RRGGBB' to the opaque 'FFRRGGBB' form spreadsheets use. */
export function toArgb(hex: string): string {
  return `FF${hex.replace('#', '').toUpperCase()}`;
}
