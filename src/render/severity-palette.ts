import type { Severity } from '../core/findings/finding.ts';

/**
 * Our own colours for severities, shared by the workbook fills and the HTML
 * badges so both outputs agree (docs/style.md says how they were chosen).
 * Worse is darker: printed in grey the fills still step from light (info,
 * pass) to dark (fail, error), and every pair stays apart for the common
 * colour-vision deficiencies. Text on each fill has a contrast of 7:1 or more.
 * Colour is never the only signal: the word is always shown, and the mark
 * beside it has a shape of its own.
 */
export const SEVERITY_COLOURS: Record<Severity, { fill: string; text: string }> = {
  fail: { fill: '#97312D', text: '#FFFFFF' },
  warning: { fill: '#D58F3D', text: '#000000' },
  advice: { fill: '#95C6F1', text: '#000000' },
  pass: { fill: '#A5E7D0', text: '#000000' },
  info: { fill: '#F8F6F2', text: '#000000' },
  error: { fill: '#3B364B', text: '#FFFFFF' },
};

/**
 * A mark for each severity, written before its word: the more solid the mark,
 * the worse. Shapes from the small set of geometric characters that common
 * office and system fonts all carry.
 */
export const SEVERITY_MARKS: Record<Severity, string> = {
  info: '\u25E6', // ◦ small open bullet: a note
  pass: '\u25CB', // ○ open circle: nothing to do
  advice: '\u25CA', // ◊ open lozenge: look at this
  warning: '\u25B2', // ▲ solid triangle: look again before building
  fail: '\u25A0', // ■ solid square: do not build it this way
  error: '?', // the rule could not run: the answer is unknown
};

/** The word with its mark: `▲ warning`. */
export function markedSeverity(s: Severity): string {
  return `${SEVERITY_MARKS[s]} ${s}`;
}

/** '#RRGGBB' to the opaque 'FFRRGGBB' form spreadsheets use. */
export function toArgb(hex: string): string {
  return `FF${hex.replace('#', '').toUpperCase()}`;
}
