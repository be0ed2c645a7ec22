import type { CuttingProblem } from './cutting-problem.ts';

// The arc-flow graph: nodes are lengths along a stock piece that some
// combination of pieces reaches; an arc of type i from u to u + size_i cuts
// one piece of type i. Pieces are laid longest first, and type i never more
// than its demand, so an arc of type i starts only where longer pieces and
// fewer than demand_i copies of i can reach (the usual symmetry reduction).
// Loss arcs join consecutive nodes; stock of capacity C leaves the graph at C.

export interface Arc {
  from: number;
  to: number;
  /** Piece type, or -1 for a loss arc. */
  type: number;
}

export interface ArcFlowGraph {
  /** Node positions, ascending, 0 first. */
  nodes: number[];
  arcs: Arc[];
}

export function arcFlowGraph(p: CuttingProblem): ArcFlowGraph {
  const top = Math.max(...p.stocks.map((s) => s.capacity));
  const reach = new Uint8Array(top + 1);
  reach[0] = 1;
  const arcs: Arc[] = [];
  p.types.forEach((t, i) => {
    const copies = Math.min(t.demand, Math.floor(top / t.size));
    let layer: number[] = [];
    for (let v = 0; v <= top; v++) if (reach[v]) layer.push(v);
    for (let c = 0; c < copies && layer.length > 0; c++) {
      const next: number[] = [];
      for (const u of layer) {
        const v = u + t.size;
        if (v > top) continue;
        arcs.push({ from: u, to: v, type: i });
        if (!reach[v]) {
          reach[v] = 1;
          next.push(v);
        }
      }
      layer = next;
    }
  });
  for (const s of p.stocks) reach[s.capacity] = 1;
  const nodes: number[] = [];
  for (let v = 0; v <= top; v++) if (reach[v]) nodes.push(v);
  for (let k = 0; k + 1 < nodes.length; k++) arcs.push({ from: nodes[k], to: nodes[k + 1], type: -1 });
  return { nodes, arcs };
}
