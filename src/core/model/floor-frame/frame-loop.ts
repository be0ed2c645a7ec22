import type { Rail } from '../cable-net/outline.ts';

// The floor frame's centre line in plan as a closed loop of straight beam
// elements: the rear rail, the two side rails and the front rail, with the
// front corners bent round arcs (a steam-bent front rail) or square. Square
// corners are rigid joints (the elements meet at one node and turn with it).
// Coordinates as the floor outline: x from the rear inner face forwards, y
// to the left; the centre line lies half a rail width outside the inner face.
// Arcs are drawn as chords of at most `arcStepDeg` each.

export interface LoopShape {
  /** Clear inner depth and width, mm. */
  depth: number;
  width: number;
  /** Rail width in plan, mm. */
  rail: number;
  /** Inner radius of the two front corners, mm (0: square corners). */
  innerRadius: number;
  arcStepDeg: number;
}

/** A point the loop must have a node at: where a strap end pulls or a lashed part bears. */
export interface LoopMark {
  /** The rail the point lies on, seen from the floor's centre. */
  side: Rail;
  /** Its coordinate across that rail's straps: y on the rear and front, x on the sides, mm. */
  at: number;
}

export interface LoopNode {
  x: number;
  y: number;
}

export interface LoopElement {
  a: number;
  b: number;
  rail: Rail;
}

export interface FrameLoop {
  nodes: LoopNode[];
  elements: LoopElement[];
  /** The node of each mark, in the order given. */
  markNodes: number[];
  /** Centre-line radius of the front corners, mm (0: square). */
  centreRadius: number;
}

interface Piece {
  rail: Rail;
  /** The point at parameter p: a length along a straight piece, an angle along an arc. */
  point: (p: number) => LoopNode;
  from: number;
  to: number;
  arc: boolean;
}

const EPS = 1e-9;

export function frameLoop(shape: LoopShape, marks: readonly LoopMark[]): FrameLoop {
  const { depth: D, width: W, rail: w } = shape;
  const r = shape.innerRadius;
  const rc = r > 0 ? r + w / 2 : 0;
  const xr = -w / 2;
  const xf = D + w / 2;
  const ys = W / 2 + w / 2;
  // Arc centres sit where the straight inner faces stop.
  const cx = D - r;
  const cy = W / 2 - r;
  const pieces: Piece[] = [
    { rail: 'rear', point: (p) => ({ x: xr, y: p }), from: -ys, to: ys, arc: false },
    { rail: 'left', point: (p) => ({ x: p, y: ys }), from: xr, to: r > 0 ? cx : xf, arc: false },
    ...(r > 0 ? [{ rail: 'front' as Rail, point: (p: number) => ({ x: cx + rc * Math.sin(p), y: cy + rc * Math.cos(p) }), from: 0, to: Math.PI / 2, arc: true }] : []),
    { rail: 'front', point: (p) => ({ x: xf, y: -p }), from: -(r > 0 ? cy : ys), to: r > 0 ? cy : ys, arc: false },
    ...(r > 0 ? [{ rail: 'front' as Rail, point: (p: number) => ({ x: cx + rc * Math.cos(p), y: -cy - rc * Math.sin(p) }), from: 0, to: Math.PI / 2, arc: true }] : []),
    { rail: 'right', point: (p) => ({ x: -p, y: -ys }), from: -(r > 0 ? cx : xf), to: -xr, arc: false },
  ];
  // Where a mark lies: the piece and its parameter there.
  const locate = (m: LoopMark): [number, number] => {
    switch (m.side) {
      case 'rear':
        return [0, m.at];
      case 'left':
      case 'right': {
        const straight = m.side === 'left' ? 1 : pieces.length - 1;
        if (r === 0 || m.at <= cx) return [straight, m.side === 'left' ? m.at : -m.at];
        // On a corner arc: the point of the arc at this x.
        const t = Math.acos(Math.min(1, (m.at - cx) / rc));
        return m.side === 'left' ? [2, Math.PI / 2 - t] : [4, t];
      }
      case 'front': {
        const frontPiece = r > 0 ? 3 : 2;
        if (r === 0 || Math.abs(m.at) <= cy) return [frontPiece, -m.at];
        const t = Math.asin(Math.min(1, (Math.abs(m.at) - cy) / rc));
        return m.at > 0 ? [2, Math.PI / 2 - t] : [4, t];
      }
    }
  };
  const stations: number[][] = pieces.map((pc) => {
    const s = [pc.from];
    if (pc.arc) {
      const n = Math.max(1, Math.ceil((pc.to - pc.from) / ((shape.arcStepDeg * Math.PI) / 180) - EPS));
      for (let k = 1; k < n; k++) s.push(pc.from + ((pc.to - pc.from) * k) / n);
    }
    return s;
  });
  const placed = marks.map(locate);
  for (const [i, p] of placed) stations[i].push(p);
  const nodes: LoopNode[] = [];
  const elements: LoopElement[] = [];
  // Each piece's node parameters (ascending) and their nodes, to find a mark's node by a search.
  const params: number[][] = [];
  const paramNodes: number[][] = [];
  pieces.forEach((pc, i) => {
    const sorted = stations[i].filter((p) => p >= pc.from - EPS && p < pc.to - EPS).sort((a, b) => a - b);
    const unique = sorted.filter((p, k) => k === 0 || p - sorted[k - 1] > EPS);
    params.push(unique);
    paramNodes.push(unique.map((_, k) => nodes.length + k));
    for (const p of unique) {
      const prev = nodes.length - 1;
      nodes.push(pc.point(p));
      if (prev >= 0) elements.push({ a: prev, b: prev + 1, rail: pieces[i - (unique[0] === p ? 1 : 0)].rail });
    }
  });
  elements.push({ a: nodes.length - 1, b: 0, rail: pieces[pieces.length - 1].rail });
  // A mark at a piece's end is the next piece's first node.
  const markNodes = placed.map(([i, p]) => {
    if (Math.abs(p - pieces[i].to) <= EPS) return paramNodes[(i + 1) % pieces.length][0];
    const k = nearest(params[i], p);
    if (k >= 0 && Math.abs(params[i][k] - p) <= EPS) return paramNodes[i][k];
    throw new Error(`no loop node for a mark on the ${pieces[i].rail} rail at ${p}`);
  });
  return { nodes, elements, markNodes, centreRadius: rc };
}

/** Index of the value nearest p in an ascending list (-1 when empty), by bisection. */
function nearest(sorted: readonly number[], p: number): number {
  if (!sorted.length) return -1;
  let lo = 0;
  let hi = sorted.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] <= p) lo = mid;
    else hi = mid;
  }
  return Math.abs(sorted[hi] - p) < Math.abs(sorted[lo] - p) ? hi : lo;
}
