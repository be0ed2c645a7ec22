// The box a line of text takes on paper, estimated from its font size and its
// characters without a font at hand. Widths are per character class, in em,
// at or above those of the common sans-serif faces in bold (measured in a
// browser once), then widened by a margin, so an estimate errs large: a box
// that does not overlap another here does not overlap it on the page.

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export type Anchor = 'start' | 'middle' | 'end';

export interface Font {
  /** Size, paper mm (the SVG user unit). */
  size: number;
  bold?: boolean;
}

/** Above the baseline and below it, em: the ascent and descent of the faces, rounded up. */
export const ASCENT = 0.95;
export const DESCENT = 0.25;
/** Widening over the measured widths, for a wider face on the reader's machine. */
const MARGIN = 1.1;
/** Room at each end of a line, em. */
const SIDE = 0.12;

const CLASSES: [RegExp, number][] = [
  [/[ijl.,:;'|!I/\\[\] ft]/, 0.34],
  [/[r()\-`·²{}*°]/, 0.4],
  [/[ABCDEGHKNPRSUVXY&w]/, 0.78],
  [/[OQØMm]/, 0.89],
  [/[%W…→@—]/, 1.02],
];
/** Lower case, figures and the rest. */
const OTHER = 0.62;

export function charWidth(c: string): number {
  return CLASSES.find(([re]) => re.test(c))?.[1] ?? OTHER;
}

/** Estimated advance of the text, paper mm. */
export function textWidth(text: string, font: Font): number {
  let em = 0;
  for (const c of text) em += charWidth(c);
  return em * font.size * MARGIN * (font.bold ? 1.05 : 1);
}

/** The box of a text drawn at (x, y) on its baseline with the given anchor. */
export function textBox(x: number, y: number, text: string, font: Font, anchor: Anchor): Box {
  const w = textWidth(text, font);
  const left = anchor === 'start' ? x : anchor === 'end' ? x - w : x - w / 2;
  // A browser's box may reach a little past the advance at either end (a glyph from a fallback face, overhanging ink).
  const side = SIDE * font.size;
  return { x: left - side, y: y - ASCENT * font.size, w: w + 2 * side, h: (ASCENT + DESCENT) * font.size };
}

/** True where the boxes share area, each grown by `gap` on every side. */
export function boxesOverlap(a: Box, b: Box, gap = 0): boolean {
  return a.x - gap < b.x + b.w + gap && b.x - gap < a.x + a.w + gap && a.y - gap < b.y + b.h + gap && b.y - gap < a.y + a.h + gap;
}

/** The area the boxes share. */
export function overlapArea(a: Box, b: Box): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

export function grow(b: Box, by: number): Box {
  return { x: b.x - by, y: b.y - by, w: b.w + 2 * by, h: b.h + 2 * by };
}
