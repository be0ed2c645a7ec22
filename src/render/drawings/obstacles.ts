import type { Box } from './text-box.ts';

// What is drawn on a sheet, as far as a label must keep off it: filled areas
// as boxes, lines and outlines as segments, circles as rings (a label may sit
// inside a large circle or outside it, not across its line) and small round
// marks as discs. Paper mm throughout.

export type Pt = [number, number];

export type Obstacle =
  | { kind: 'box'; box: Box }
  | { kind: 'segment'; p: Pt; q: Pt; pad: number }
  | { kind: 'ring'; c: Pt; r: number; pad: number }
  | { kind: 'disc'; c: Pt; r: number };

/** Room kept between a label and a line, paper mm: a little over half a thick stroke. */
export const LINE_PAD = 0.4;

export function hits(b: Box, o: Obstacle): boolean {
  switch (o.kind) {
    case 'box':
      return b.x < o.box.x + o.box.w && o.box.x < b.x + b.w && b.y < o.box.y + o.box.h && o.box.y < b.y + b.h;
    case 'segment':
      return segmentCrossesRect(o.p, o.q, b.x - o.pad, b.y - o.pad, b.x + b.w + o.pad, b.y + b.h + o.pad);
    case 'ring':
      return nearest(b, o.c) <= o.r + o.pad && farthest(b, o.c) >= o.r - o.pad;
    case 'disc':
      return nearest(b, o.c) <= o.r;
  }
}

/** Distance from the point to the nearest point of the box (0 inside it). */
function nearest(b: Box, c: Pt): number {
  const dx = Math.max(b.x - c[0], 0, c[0] - (b.x + b.w));
  const dy = Math.max(b.y - c[1], 0, c[1] - (b.y + b.h));
  return Math.hypot(dx, dy);
}

function farthest(b: Box, c: Pt): number {
  const dx = Math.max(Math.abs(b.x - c[0]), Math.abs(b.x + b.w - c[0]));
  const dy = Math.max(Math.abs(b.y - c[1]), Math.abs(b.y + b.h - c[1]));
  return Math.hypot(dx, dy);
}

/** True where any part of the segment pq lies in the box (Liang-Barsky clipping). */
export function segmentCrossesBox(p: Pt, q: Pt, b: Box): boolean {
  return segmentCrossesRect(p, q, b.x, b.y, b.x + b.w, b.y + b.h);
}

/**
 * The same for the rectangle x0..x1, y0..y1, without allocating: label
 * placement asks it for every candidate against every line of a drawing.
 */
function segmentCrossesRect(p: Pt, q: Pt, x0: number, y0: number, x1: number, y1: number): boolean {
  // Most segments lie wholly to one side of a small label box.
  if (Math.max(p[0], q[0]) < x0 || Math.min(p[0], q[0]) > x1 || Math.max(p[1], q[1]) < y0 || Math.min(p[1], q[1]) > y1) return false;
  const dx = q[0] - p[0];
  const dy = q[1] - p[1];
  range[0] = 0;
  range[1] = 1;
  return clipEdge(-dx, p[0] - x0) && clipEdge(dx, x1 - p[0]) && clipEdge(-dy, p[1] - y0) && clipEdge(dy, y1 - p[1]);
}

/** Liang-Barsky's parameter range [lo, hi] of the segment still inside, kept here so a test allocates nothing (no closure). */
const range = new Float64Array(2);

/** Narrows the range by one edge; false once nothing of the segment is left inside. */
function clipEdge(den: number, num: number): boolean {
  if (den === 0) return num >= 0;
  const t = num / den;
  if (den < 0) range[0] = Math.max(range[0], t);
  else range[1] = Math.min(range[1], t);
  return range[0] <= range[1];
}

/** An arc of radius r about c from angle a0 to a1 (radians, SVG's y down), as segments. */
export function arcSegments(c: Pt, r: number, a0: number, a1: number, pad = LINE_PAD): Obstacle[] {
  const n = Math.max(2, Math.ceil((Math.abs(a1 - a0) * r) / 2));
  const pts = Array.from({ length: n + 1 }, (_, i): Pt => {
    const a = a0 + ((a1 - a0) * i) / n;
    return [c[0] + r * Math.cos(a), c[1] + r * Math.sin(a)];
  });
  return pts.slice(1).map((q, i) => ({ kind: 'segment', p: pts[i], q, pad }));
}

/** A polyline as segments. */
export function polylineSegments(pts: readonly Pt[], pad = LINE_PAD): Obstacle[] {
  return pts.slice(1).map((q, i) => ({ kind: 'segment', p: pts[i], q, pad }));
}
