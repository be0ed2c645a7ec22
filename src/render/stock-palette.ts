/**
 * Our own plain fills for the parts on a stock bar, light enough for black
 * labels; the offcut is a pale grey. Colour is never the only signal: each
 * part's label is written on its bar and the cuts are listed in words.
 */
const PART_FILLS = ['#8FBCE6', '#F4B26A', '#94D8A0', '#E99A9A', '#C3A6E0', '#EFD873', '#7FD1C7', '#D9A77E', '#B4BEC9', '#E6B8D8'];

export const OFFCUT_FILL = '#EEEEEE';

export function partFill(labels: readonly string[], label: string): string {
  const i = labels.indexOf(label);
  return PART_FILLS[(i < 0 ? 0 : i) % PART_FILLS.length];
}
