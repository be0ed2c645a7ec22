import type { CableNet, Strap } from './net.ts';

// A crew member's weight spread over the straps under their foot patch, as a
// uniform load per unit length of strap (equal to a uniform pressure in a
// two-way weave, where every cell holds the same length of strap each way),
// lumped at the nodes. A node takes the strap length halfway to its
// neighbours that lies inside the patch; a first or last node also takes the
// whole end interval, so all the weight goes through the net (none straight
// into the frame: the safe side for the straps).

export interface FootPatch {
  /** Centre, mm. */
  x: number;
  y: number;
  /** Front to back (along x) and side to side (along y), mm. */
  length: number;
  width: number;
}

export interface NodeWeight {
  node: number;
  w: number;
}

function overlap(lo: number, hi: number, a: number, b: number): number {
  return Math.max(0, Math.min(hi, b) - Math.max(lo, a));
}

function strapShare(strap: Strap, patch: FootPatch, into: Map<number, number>): void {
  const along = strap.family === 'front-to-back' ? [patch.x - patch.length / 2, patch.x + patch.length / 2] : [patch.y - patch.width / 2, patch.y + patch.width / 2];
  const across = strap.family === 'front-to-back' ? Math.abs(strap.cross - patch.y) <= patch.width / 2 : Math.abs(strap.cross - patch.x) <= patch.length / 2;
  if (!across) return;
  const p = strap.points;
  for (let k = 1; k < p.length - 1; k++) {
    const lo = k === 1 ? p[0].s : (p[k - 1].s + p[k].s) / 2;
    const hi = k === p.length - 2 ? p[p.length - 1].s : (p[k].s + p[k + 1].s) / 2;
    const len = overlap(lo, hi, along[0], along[1]);
    if (len > 0) into.set(p[k].node, (into.get(p[k].node) ?? 0) + len);
  }
}

/** Fractions of one person's load on each node, summing to 1. */
export function patchWeights(net: CableNet, patch: FootPatch): NodeWeight[] {
  const lengths = new Map<number, number>();
  for (const strap of net.straps) strapShare(strap, patch, lengths);
  let total = 0;
  for (const v of lengths.values()) total += v;
  if (total === 0) {
    // A patch narrower than the pitch, between straps: the nearest node takes it all.
    let best = 0;
    net.nodes.forEach((q, i) => {
      if (Math.hypot(q.x - patch.x, q.y - patch.y) < Math.hypot(net.nodes[best].x - patch.x, net.nodes[best].y - patch.y)) best = i;
    });
    return net.nodes.length ? [{ node: best, w: 1 }] : [];
  }
  return [...lengths].map(([node, len]) => ({ node, w: len / total }));
}
