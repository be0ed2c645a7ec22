import { hits, type Obstacle, type Pt } from './obstacles.ts';
import { ASCENT, boxesOverlap, DESCENT, overlapArea, textBox, type Anchor, type Box, type Font } from './text-box.ts';

// Greedy label placement. Labels are placed one by one in the order asked
// (the most important first): each tries its own first position, then spots
// around its anchor on rings of growing distance, and takes the first whose
// box stays on the sheet, clear of every label already placed and of every
// drawn shape. A label that had to move away from its anchor gets a leader
// line back to it. Fixed texts (titles, dimension figures) are placed where
// they are asked to be and kept clear of by the rest.

export type Direction = 'e' | 'ne' | 'n' | 'nw' | 'w' | 'sw' | 's' | 'se';
const DIRECTIONS: Direction[] = ['e', 'ne', 'n', 'nw', 'w', 'sw', 's', 'se'];
/** Unit steps on paper (y down) of each direction. */
const STEP: Record<Direction, Pt> = { e: [1, 0], ne: [0.7, -0.7], n: [0, -1], nw: [-0.7, -0.7], w: [-1, 0], sw: [-0.7, 0.7], s: [0, 1], se: [0.7, 0.7] };
/** Ring distances, in multiples of the label's gap. */
const RINGS = [1, 2, 3, 4, 5.5, 7, 9, 11.5, 14, 17, 21, 25, 30, 36, 43, 50];
/** Room kept between two labels, paper mm. */
export const LABEL_GAP = 0.6;
/** Line spacing of a label of several lines, in em. */
const LINE_STEP = ASCENT + DESCENT + 0.05;

export interface LabelRequest {
  /** One or more lines, each its own text element. */
  text: string | readonly string[];
  /** The point the label names. */
  at: Pt;
  font: Font;
  cls: string;
  /** Where the label would sit by preference: its baseline point and anchor. */
  first?: { x: number; y: number; anchor: Anchor };
  /** Directions to try first around the anchor; the rest follow. */
  prefer?: readonly Direction[];
  /** Distance from the anchor to the nearest edge of the label at the first ring, paper mm. */
  gap?: number;
}

export interface PlacedLabel {
  lines: { x: number; y: number; text: string }[];
  anchor: Anchor;
  box: Box;
  cls: string;
  /** From the anchor to the label's edge, where it moved away. */
  leader?: [Pt, Pt];
  /** True where no clear spot was found and the label overlaps something. */
  forced: boolean;
}

interface Candidate {
  x: number;
  y: number;
  anchor: Anchor;
  box: Box;
  leader?: [Pt, Pt];
}

export class LabelPlacer {
  readonly placed: PlacedLabel[] = [];
  readonly obstacles: Obstacle[] = [];
  constructor(readonly bounds: Box) {}

  avoid(...o: Obstacle[]): void {
    this.obstacles.push(...o);
  }

  /** A text placed where it is asked to be; later labels keep clear of it. */
  fixed(x: number, y: number, text: string, font: Font, anchor: Anchor, cls: string): PlacedLabel {
    const p: PlacedLabel = { lines: [{ x, y, text }], anchor, box: textBox(x, y, text, font, anchor), cls, forced: false };
    this.placed.push(p);
    return p;
  }

  place(req: LabelRequest): PlacedLabel {
    const lines = typeof req.text === 'string' ? [req.text] : [...req.text];
    const cands = this.candidates(req, lines);
    const clearOfLabels = (c: Candidate) =>
      this.onSheet(c.box) && !this.placed.some((p) => boxesOverlap(c.box, p.box, LABEL_GAP) || (c.leader && hits(p.box, { kind: 'segment', p: c.leader[0], q: c.leader[1], pad: 0.2 })));
    const crossings = (c: Candidate) => this.obstacles.filter((o) => hits(c.box, o)).length;
    // Clear of everything; else clear of the other labels, crossing the fewest lines; else the least overlap.
    const free = cands.filter(clearOfLabels);
    const chosen = free.find((c) => crossings(c) === 0) ?? least(free, crossings);
    const c = chosen ?? least(cands, (x) => this.overlap(x))!;
    const p: PlacedLabel = {
      lines: lines.map((text, i) => ({ x: c.x, y: c.y + i * LINE_STEP * req.font.size, text })),
      anchor: c.anchor,
      box: c.box,
      cls: req.cls,
      ...(c.leader ? { leader: c.leader } : {}),
      forced: chosen === undefined,
    };
    this.placed.push(p);
    if (c.leader) this.avoid({ kind: 'segment', p: c.leader[0], q: c.leader[1], pad: 0.3 });
    return p;
  }

  private onSheet(b: Box): boolean {
    const s = this.bounds;
    return b.x >= s.x && b.y >= s.y && b.x + b.w <= s.x + s.w && b.y + b.h <= s.y + s.h;
  }

  private overlap(c: Candidate): number {
    return this.placed.reduce((sum, p) => sum + overlapArea(c.box, p.box), 0) + (this.onSheet(c.box) ? 0 : 1e6);
  }

  private candidates(req: LabelRequest, lines: string[]): Candidate[] {
    const f = req.font;
    const w = Math.max(...lines.map((t) => textBox(0, 0, t, f, 'start').w));
    // The box reaches this far past the text's ends (text-box.ts); x is where the text starts, ends or centres.
    const side = -textBox(0, 0, '', f, 'start').x;
    const xAt = (left: number, anchor: Anchor) => (anchor === 'start' ? left + side : anchor === 'end' ? left + w - side : left + w / 2);
    const h = (lines.length - 1) * LINE_STEP * f.size + (ASCENT + DESCENT) * f.size;
    const gap = req.gap ?? 1.5;
    const out: Candidate[] = [];
    if (req.first) {
      const { x, y, anchor } = req.first;
      const left = anchor === 'start' ? x - side : anchor === 'end' ? x - w + side : x - w / 2;
      out.push({ x, y, anchor, box: { x: left, y: y - ASCENT * f.size, w, h } });
    }
    const order = [...(req.prefer ?? []), ...DIRECTIONS.filter((d) => !req.prefer?.includes(d))];
    const [ax, ay] = req.at;
    RINGS.forEach((k, ring) => {
      for (const d of order) {
        const [ux, uy] = STEP[d];
        const r = k * gap;
        // The box's edge (or corner) nearest the anchor sits r from it.
        const [ox, oy] = [ax + r * ux, ay + r * uy];
        const left = ux > 0 ? ox : ux < 0 ? ox - w : ax - w / 2;
        const top = uy > 0 ? oy : uy < 0 ? oy - h : ay - h / 2;
        const anchor: Anchor = ux > 0 ? 'start' : ux < 0 ? 'end' : 'middle';
        const box = { x: left, y: top, w, h };
        out.push({ x: xAt(left, anchor), y: top + ASCENT * f.size, anchor, box, ...(ring > 0 || req.first ? { leader: leaderTo(req.at, box) } : {}) });
      }
    });
    return out.map((c) => (c.leader && Math.hypot(c.leader[1][0] - c.leader[0][0], c.leader[1][1] - c.leader[0][1]) < 2 * gap ? { ...c, leader: undefined } : c));
  }
}

/** The first item of the list with the least cost; undefined for an empty list. */
function least<T>(list: readonly T[], cost: (x: T) => number): T | undefined {
  let best: T | undefined;
  let bestCost = Infinity;
  for (const x of list) {
    const k = cost(x);
    if (k < bestCost) [best, bestCost] = [x, k];
  }
  return best;
}

/** From a little off the anchor to the nearest point of the box, or none where the anchor is inside it. */
function leaderTo(at: Pt, b: Box): [Pt, Pt] | undefined {
  const q: Pt = [Math.min(Math.max(at[0], b.x), b.x + b.w), Math.min(Math.max(at[1], b.y), b.y + b.h)];
  const len = Math.hypot(q[0] - at[0], q[1] - at[1]);
  if (len === 0) return undefined;
  const off = Math.min(0.8, len / 3);
  const p: Pt = [at[0] + ((q[0] - at[0]) * off) / len, at[1] + ((q[1] - at[1]) * off) / len];
  return [p, q];
}
