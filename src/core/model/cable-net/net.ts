import type { Rail } from './outline.ts';

// A cable net: straps as chains of tension-only segments between points, each
// point a free node (vertical motion only) or a fixed end on the frame.
// Units: mm and N throughout (EA in N, since MPa x mm² = N).

export type Family = 'front-to-back' | 'side-to-side';

export interface NetNode {
  x: number;
  y: number;
}

/** A point along a strap: `s` its coordinate along the strap, `node` its index, or -1 at a fixed end. */
export interface StrapPoint {
  s: number;
  node: number;
}

export interface Strap {
  family: Family;
  /** 1-based within its family: front-to-back from the right, side-to-side from the rear. */
  number: number;
  of: number;
  /** Its position across its direction: y for front-to-back, x for side-to-side. */
  cross: number;
  points: StrapPoint[];
  /** Rails at its first and last point. */
  rails: [Rail, Rail];
  /** Index of its first segment; it owns points.length - 1 segments from there. */
  firstSegment: number;
}

export interface Segment {
  strap: number;
  /** End nodes; -1 is a fixed end on the frame. */
  a: number;
  b: number;
  /** Length in plan (unchanged: in-plane motion is neglected). */
  flat: number;
  /** Unstretched length, flat / (1 + T_0/EA). */
  rest: number;
  EA: number;
}

export interface CableNet {
  nodes: NetNode[];
  straps: Strap[];
  segments: Segment[];
}

/** One strap to lay into a net: its line, its end points and the stations where nodes go. */
export interface StrapLine {
  family: Family;
  number: number;
  of: number;
  cross: number;
  start: number;
  end: number;
  rails: [Rail, Rail];
  /** Node positions strictly between start and end, ascending; a shared `key` joins straps at a crossing. */
  stations: { s: number; key?: string }[];
  EA: number;
  pretension: number;
  /** Each interval between points is split into this many segments (1 = nodes at the stations only). */
  refine: number;
}

/** The unstretched length of a segment of flat length `flat` that carries T_0 when flat. */
export function restLength(flat: number, pretension: number, EA: number): number {
  return flat / (1 + pretension / EA);
}

export function buildNet(lines: readonly StrapLine[]): CableNet {
  const nodes: NetNode[] = [];
  const shared = new Map<string, number>();
  const straps: Strap[] = [];
  const segments: Segment[] = [];
  const place = (l: StrapLine, s: number): NetNode => (l.family === 'front-to-back' ? { x: s, y: l.cross } : { x: l.cross, y: s });
  const newNode = (l: StrapLine, s: number): number => nodes.push(place(l, s)) - 1;
  for (const l of lines) {
    if (!(l.refine >= 1 && Number.isInteger(l.refine))) throw new Error(`refine must be a whole number of at least 1, not ${l.refine}`);
    const marks = [{ s: l.start, node: -1 }];
    for (const st of l.stations) {
      if (!(st.s > marks[marks.length - 1].s && st.s < l.end)) throw new Error(`strap stations must ascend strictly inside its ends (station ${st.s})`);
      let node = st.key === undefined ? undefined : shared.get(st.key);
      if (node === undefined) {
        node = newNode(l, st.s);
        if (st.key !== undefined) shared.set(st.key, node);
      }
      marks.push({ s: st.s, node });
    }
    marks.push({ s: l.end, node: -1 });
    const points: StrapPoint[] = [marks[0]];
    for (let i = 1; i < marks.length; i++) {
      const s0 = marks[i - 1].s;
      const step = (marks[i].s - s0) / l.refine;
      for (let k = 1; k < l.refine; k++) points.push({ s: s0 + k * step, node: newNode(l, s0 + k * step) });
      points.push(marks[i]);
    }
    const strap = straps.push({ family: l.family, number: l.number, of: l.of, cross: l.cross, points, rails: l.rails, firstSegment: segments.length }) - 1;
    for (let i = 1; i < points.length; i++) {
      const flat = points[i].s - points[i - 1].s;
      segments.push({ strap, a: points[i - 1].node, b: points[i].node, flat, rest: restLength(flat, l.pretension, l.EA), EA: l.EA });
    }
  }
  return { nodes, straps, segments };
}
