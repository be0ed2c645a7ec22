import { LabelPlacer, type LabelRequest, type PlacedLabel } from './label-placer.ts';
import { LINE_PAD, type Obstacle, type Pt } from './obstacles.ts';
import type { Anchor, Box, Font } from './text-box.ts';

// A small writer for dimensioned drawings on a sheet whose user unit is one
// millimetre of paper: lines, circles, arcs, text and dimension lines, as
// SVG text (no DOM). Dimension lines carry data-dim and data-value (the
// figure on the part, not on paper) so a drawing can be read back. Every
// shape drawn is also an obstacle for the labels, which are placed last,
// clear of the shapes and of each other (label-placer.ts).

export type { Pt };

/** Fonts by text class; `label` is the class of a text given none. */
export type Fonts = Record<string, Font> & { label: Font };

/** A circle smaller than this (paper mm) is a mark a label keeps off entirely; a larger one only its line. */
const MARK_RADIUS = 2.5;

export const n3 = (v: number) => Number(v.toFixed(3)).toString();

export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export const ARROW_DEFS =
  '<defs><marker id="dim-arrow" viewBox="0 0 6 6" refX="6" refY="3" markerWidth="2.4" markerHeight="2.4" markerUnits="userSpaceOnUse" orient="auto-start-reverse"><path d="M0,0 L6,3 L0,6 z"/></marker></defs>';

export class SvgSheet {
  readonly parts: string[] = [];
  readonly #placer: LabelPlacer;
  readonly #queued: LabelRequest[] = [];
  constructor(
    readonly fonts: Fonts,
    bounds: Box,
  ) {
    this.#placer = new LabelPlacer(bounds);
  }
  /** A line; pad is the room a label keeps from it, null for none. */
  line(p: Pt, q: Pt, cls: string, extra = '', pad: number | null = LINE_PAD): void {
    this.parts.push(`<line class="${cls}" x1="${n3(p[0])}" y1="${n3(p[1])}" x2="${n3(q[0])}" y2="${n3(q[1])}"${extra}/>`);
    if (pad !== null) this.avoid({ kind: 'segment', p, q, pad });
  }
  circle(c: Pt, r: number, cls: string, extra = ''): void {
    this.parts.push(`<circle class="${cls}" cx="${n3(c[0])}" cy="${n3(c[1])}" r="${n3(r)}"${extra}/>`);
    this.avoid(r < MARK_RADIUS ? { kind: 'disc', c, r: r + LINE_PAD } : { kind: 'ring', c, r, pad: LINE_PAD });
  }
  rect(x: number, y: number, w: number, h: number, cls: string, extra = ''): void {
    this.parts.push(`<rect class="${cls}" x="${n3(x)}" y="${n3(y)}" width="${n3(w)}" height="${n3(h)}"${extra}/>`);
    this.avoid({ kind: 'box', box: { x: x - LINE_PAD, y: y - LINE_PAD, w: w + 2 * LINE_PAD, h: h + 2 * LINE_PAD } });
  }
  /** A clockwise arc of radius r (paper mm) from p to q; the caller says what labels must keep off. */
  arc(p: Pt, q: Pt, r: number, large: boolean, cls: string, extra = '', avoid: Obstacle[] = []): void {
    this.parts.push(`<path class="${cls}" d="M ${n3(p[0])} ${n3(p[1])} A ${n3(r)} ${n3(r)} 0 ${large ? 1 : 0} 1 ${n3(q[0])} ${n3(q[1])}"${extra}/>`);
    this.avoid(...avoid);
  }
  /** A text exactly where asked; labels placed later keep clear of it. */
  text(x: number, y: number, t: string, anchor: Anchor = 'middle', cls = 'label'): void {
    this.#placer.fixed(x, y, t, this.font(cls), anchor, cls);
    this.parts.push(textElement(cls, x, y, anchor, t));
  }
  /** A label placed when the drawing is finished: at its first position if clear, else moved round its anchor. */
  label(req: Omit<LabelRequest, 'font' | 'cls'> & { cls?: string }): void {
    const cls = req.cls ?? 'label';
    this.#queued.push({ ...req, cls, font: this.font(cls) });
  }
  raw(s: string, ...avoid: Obstacle[]): void {
    this.parts.push(s);
    this.avoid(...avoid);
  }
  avoid(...o: Obstacle[]): void {
    this.#placer.avoid(...o);
  }
  /** Places the queued labels in the order given and returns every part, the labels and their leaders last. */
  finish(): string[] {
    const labels = this.#queued.splice(0).map((q) => this.#placer.place(q));
    return [...this.parts, ...labels.flatMap(labelElements)];
  }
  /** Every text placed so far, fixed or moved, with its box. */
  get placed(): readonly PlacedLabel[] {
    return this.#placer.placed;
  }
  private font(cls: string): Font {
    return this.fonts[cls] ?? this.fonts.label;
  }
}

function textElement(cls: string, x: number, y: number, anchor: Anchor, t: string): string {
  return `<text class="${cls}" x="${n3(x)}" y="${n3(y)}" text-anchor="${anchor}">${esc(t)}</text>`;
}

function labelElements(p: PlacedLabel): string[] {
  const leader = p.leader ? [`<line class="leader" x1="${n3(p.leader[0][0])}" y1="${n3(p.leader[0][1])}" x2="${n3(p.leader[1][0])}" y2="${n3(p.leader[1][1])}"/>`] : [];
  return [...leader, ...p.lines.map((l) => textElement(p.cls, l.x, l.y, p.anchor, l.text))];
}

/** The style rules of the fonts: the face and colour of every text, the size and weight by class. */
export function fontRules(fonts: Fonts): string {
  const px = (f: Font) => `font-size: ${n3(f.size)}px;${f.bold ? ' font-weight: bold;' : ''}`;
  const classes = Object.entries(fonts).filter(([c]) => c !== 'label');
  return [`text { font-family: sans-serif; ${px(fonts.label)} fill: #000; stroke: none; }`, ...classes.map(([c, f]) => `.${c} { ${px(f)} }`)].join(' ');
}

/** Attributes of a dimension line: its name, the figure it stands for, arrows at both ends. */
export function dimAttrs(name: string, value: number): string {
  return ` data-dim="${name}" data-value="${n3(value)}" marker-start="url(#dim-arrow)" marker-end="url(#dim-arrow)"`;
}
