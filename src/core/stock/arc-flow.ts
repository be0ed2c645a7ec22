import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { LpSolver } from './cutting-types.ts';
import { arcFlowGraph, type ArcFlowGraph } from './arc-flow-graph.ts';
import { buildModel, feasibleValues, isOptimal, runMip, solveCounted, type LpColumn } from './lp-model.ts';
import { settleBins } from './settle-bins.ts';
import type { SolverOutcome } from './solver-outcome.ts';
import type { WorkMeter } from './work-meter.ts';

// The arc-flow formulation (one MIP over the graph of arc-flow-graph.ts):
// flow is conserved at every node, each stock leaves at its capacity, each
// type's arcs carry at least its demand. Its LP relaxation gives the bound;
// the MIP, solved to optimality, proves the plan (Valerio de Carvalho,
// Annals of Operations Research 86 (1999)). Its MIP stops at the meter's node
// limit, never at a time limit.

export function arcFlow(p: CuttingProblem, lp: LpSolver, meter: WorkMeter, start: Bin[] | null, g: ArcFlowGraph = arcFlowGraph(p)): SolverOutcome {
  const nodeRow = new Map(g.nodes.map((v, k) => [v, k]));
  const N = g.nodes.length;
  const rows = {
    lower: [...g.nodes.map(() => 0), ...p.types.map((t) => t.demand)],
    upper: [...g.nodes.map(() => 0), ...p.types.map(() => Infinity)],
  };
  const cols: LpColumn[] = g.arcs.map((a) => ({
    cost: 0,
    upper: a.type >= 0 ? p.types[a.type].demand : Infinity,
    rows: a.type >= 0 ? [nodeRow.get(a.from)!, nodeRow.get(a.to)!, N + a.type] : [nodeRow.get(a.from)!, nodeRow.get(a.to)!],
    values: a.type >= 0 ? [-1, 1, 1] : [-1, 1],
  }));
  const A = cols.length;
  // A stock piece enters at node 0 and leaves at its capacity.
  for (const s of p.stocks) cols.push({ cost: s.weight, upper: s.available, rows: [0, nodeRow.get(s.capacity)!], values: [1, -1] });
  const model = buildModel(lp, rows, cols);
  try {
    solveCounted(model, meter);
    const lowerBound = isOptimal(lp, model) ? model.getObjectiveValue() : null;
    runMip(lp, model, meter, p.step, start ? startFlow(p, g, start) : undefined);
    const x = feasibleValues(lp, model);
    const settled = x ? settleBins(p, decompose(p, g, x, A)) : null;
    const ok = settled !== null && settled.unplaced.length === 0;
    return { bins: ok ? settled.bins : null, lowerBound, proved: ok && isOptimal(lp, model), repaired: ok && settled.repaired > 0, method: 'arc flow MIP' };
  } finally {
    model.dispose();
  }
}

/** The flow of a set of bins, each a path longest piece first, for a MIP start (none if a bin has no path). */
function startFlow(p: CuttingProblem, g: ArcFlowGraph, bins: Bin[]): number[] | undefined {
  const index = new Map(g.arcs.map((a, k) => [`${a.from}:${a.type}`, k]));
  const x = [...g.arcs.map(() => 0), ...p.stocks.map(() => 0)];
  for (const b of bins) {
    let at = 0;
    for (const i of [...b.items].sort((u, v) => u - v)) {
      const k = index.get(`${at}:${i}`);
      if (k === undefined) return undefined;
      x[k]++;
      at += p.types[i].size;
    }
    const end = p.stocks[b.stock].capacity;
    while (at < end) {
      const k = index.get(`${at}:-1`)!;
      x[k]++;
      at = g.arcs[k].to;
    }
    x[g.arcs.length + b.stock]++;
  }
  return x;
}

/** Split an integer flow into paths, one a stock piece. */
function decompose(p: CuttingProblem, g: ArcFlowGraph, x: Float64Array, A: number): Bin[] {
  const out = new Map<number, number[]>();
  const left = Array.from(x, Math.round);
  g.arcs.forEach((a, k) => {
    if (left[k] > 0) out.set(a.from, [...(out.get(a.from) ?? []), k]);
  });
  const exits = new Map<number, number[]>();
  p.stocks.forEach((s, k) => {
    if (left[A + k] > 0) exits.set(s.capacity, [...(exits.get(s.capacity) ?? []), k]);
  });
  const bins: Bin[] = [];
  let pieces = p.stocks.reduce((n, _, k) => n + left[A + k], 0);
  while (pieces-- > 0) {
    const items: number[] = [];
    let at = 0;
    for (;;) {
      const exit = (exits.get(at) ?? []).find((k) => left[A + k] > 0);
      const arc = (out.get(at) ?? []).find((k) => left[k] > 0);
      // Leave where a stock ends unless flow carries on to cut more.
      if (exit !== undefined && (arc === undefined || g.arcs[arc].type < 0)) {
        left[A + exit]--;
        bins.push({ stock: exit, items });
        break;
      }
      if (arc === undefined) throw new Error('arc-flow solution breaks flow conservation');
      left[arc]--;
      if (g.arcs[arc].type >= 0) items.push(g.arcs[arc].type);
      at = g.arcs[arc].to;
    }
  }
  return bins;
}
