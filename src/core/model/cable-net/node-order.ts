import type { CableNet } from './net.ts';

// A numbering of the nodes that keeps the stiffness matrix's envelope small:
// sweep the floor in rows along one axis or the other, whichever stores less.

/** Node pairs joined by a segment (fixed ends left out). */
export function coupledPairs(net: CableNet): [number, number][] {
  return net.segments.filter((s) => s.a >= 0 && s.b >= 0).map((s) => [s.a, s.b]);
}

function envelope(order: Int32Array, pairs: readonly [number, number][]): number {
  const first = Int32Array.from(order.keys());
  for (const [i, j] of pairs) {
    const I = order[i];
    const J = order[j];
    if (I > J) first[I] = Math.min(first[I], J);
    else first[J] = Math.min(first[J], I);
  }
  let size = 0;
  for (let r = 0; r < first.length; r++) size += r - first[r] + 1;
  return size;
}

function sweep(net: CableNet, major: 'x' | 'y'): Int32Array {
  const minor = major === 'x' ? 'y' : 'x';
  const ids = net.nodes.map((_, i) => i).sort((p, q) => net.nodes[p][major] - net.nodes[q][major] || net.nodes[p][minor] - net.nodes[q][minor]);
  const order = new Int32Array(ids.length);
  ids.forEach((node, place) => (order[node] = place));
  return order;
}

export function nodeOrder(net: CableNet): Int32Array {
  const pairs = coupledPairs(net);
  const byX = sweep(net, 'x');
  const byY = sweep(net, 'y');
  return envelope(byX, pairs) <= envelope(byY, pairs) ? byX : byY;
}
