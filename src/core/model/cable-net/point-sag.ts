import type { Family, CableNet, Strap } from './net.ts';
import type { NodeWeight } from './foot-patch.ts';
import type { FloorOutline } from './outline.ts';

// The sag at a point of the floor as a weighted sum of nodal sags: linear
// along each strap (a strap between nodes is straight), linear across between
// the two straps either side (or the frame, which does not move). In a
// two-way weave both families give the same bilinear value on the crossing
// grid; their mean is taken.

function alongStrap(strap: Strap, s: number, scale: number, into: NodeWeight[]): void {
  const p = strap.points;
  if (s <= p[0].s || s >= p[p.length - 1].s) return;
  let k = 0;
  while (p[k + 1].s < s) k++;
  const t = (s - p[k].s) / (p[k + 1].s - p[k].s);
  if (p[k].node >= 0) into.push({ node: p[k].node, w: scale * (1 - t) });
  if (p[k + 1].node >= 0) into.push({ node: p[k + 1].node, w: scale * t });
}

const sortedCache = new WeakMap<CableNet, Map<Family, Strap[]>>();

/** The net's straps of one family in order across, computed once per net. */
function sorted(net: CableNet, family: Family): Strap[] {
  let byFamily = sortedCache.get(net);
  if (!byFamily) sortedCache.set(net, (byFamily = new Map<Family, Strap[]>()));
  let list = byFamily.get(family);
  if (!list) byFamily.set(family, (list = net.straps.filter((t) => t.family === family).sort((a, b) => a.cross - b.cross)));
  return list;
}

function familyWeights(net: CableNet, outline: FloorOutline, family: Family, x: number, y: number, scale: number, into: NodeWeight[]): void {
  const fb = family === 'front-to-back';
  const [q, s] = fb ? [y, x] : [x, y];
  const straps = sorted(net, family);
  const above = straps.findIndex((t) => t.cross > q);
  const hi = above < 0 ? undefined : straps[above];
  const lo = above < 0 ? straps[straps.length - 1] : above > 0 ? straps[above - 1] : undefined;
  const qLo = lo?.cross ?? (fb ? -outline.halfWidthAt(x) : 0);
  const qHi = hi?.cross ?? (fb ? outline.halfWidthAt(x) : outline.frontAt(y));
  const t = qHi > qLo ? Math.min(1, Math.max(0, (q - qLo) / (qHi - qLo))) : 0;
  if (lo) alongStrap(lo, s, scale * (1 - t), into);
  if (hi) alongStrap(hi, s, scale * t, into);
}

export function pointWeights(net: CableNet, outline: FloorOutline, x: number, y: number): NodeWeight[] {
  const families = (['front-to-back', 'side-to-side'] as const).filter((f) => sorted(net, f).length > 0);
  const out: NodeWeight[] = [];
  for (const f of families) familyWeights(net, outline, f, x, y, 1 / families.length, out);
  return out;
}

export function weightedSum(weights: readonly NodeWeight[], v: ArrayLike<number>): number {
  return weights.reduce((sum, { node, w }) => sum + w * v[node], 0);
}
