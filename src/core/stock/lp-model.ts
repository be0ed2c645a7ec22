import type { Model } from 'highs';
import type { LpSolver } from './cutting-types.ts';
import type { WorkMeter } from './work-meter.ts';

// A small layer over the persistent HiGHS model: columns given sparse, one
// model kept and re-solved (column generation adds columns to it; the
// arc-flow MIP runs its LP relaxation first in the same model).

export interface LpColumn {
  cost: number;
  upper: number;
  rows: number[];
  values: number[];
}

export interface LpRows {
  lower: number[];
  upper: number[];
}

export function buildModel(lp: LpSolver, rows: LpRows, cols: LpColumn[]): Model {
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  for (const c of cols) {
    indices.push(...c.rows);
    values.push(...c.values);
    starts.push(indices.length);
  }
  const model = lp.createModel({
    numCols: cols.length,
    numRows: rows.lower.length,
    colCost: cols.map((c) => c.cost),
    colLower: cols.map(() => 0),
    colUpper: cols.map((c) => finite(lp, c.upper)),
    rowLower: rows.lower.map((v) => finite(lp, v)),
    rowUpper: rows.upper.map((v) => finite(lp, v)),
    matrix: { format: 'csc', numRows: rows.lower.length, numCols: cols.length, starts, indices, values },
  });
  // HiGHS's own choices are seeded; its default seed is fixed here so a plan never rests on it changing.
  model.options.set({ output_flag: false, random_seed: 0 });
  return model;
}

export function addColumn(lp: LpSolver, model: Model, c: LpColumn): void {
  model.addCol(c.cost, 0, finite(lp, c.upper), { indices: c.rows, values: c.values });
}

/** Solve the model as it stands, its simplex iterations drawn from the meter. */
export function solveCounted(model: Model, meter: WorkMeter): void {
  model.run();
  meter.spend('simplexIterations', Number(model.info.get('simplex_iteration_count')));
}

/**
 * Make every column integer, then solve as a MIP within the nodes the meter
 * has left (a node limit, not a time limit: HiGHS then stops at the same
 * node on any machine).
 */
export function runMip(lp: LpSolver, model: Model, meter: WorkMeter, step: number, start?: number[]): void {
  const n = model.getDimensions().numCols;
  if (n > 0) model.changeColsIntegrality({ kind: 'range', from: 0, to: n - 1 }, Array(n).fill(lp.constants.variableType.integer));
  // A plan's objective moves in whole steps: a gap under one step is optimal.
  model.options.set({ mip_max_nodes: Math.max(1, meter.left('mipNodes')), mip_rel_gap: 0, mip_abs_gap: step > 0 ? step * (1 - 1e-6) : 1e-6 });
  if (start) model.setSolution({ colValue: start });
  model.run();
  meter.spend('mipNodes', Number(model.info.get('mip_node_count')));
}

/** Primal values if the last solve left a feasible solution. */
export function feasibleValues(lp: LpSolver, model: Model): Float64Array | null {
  const status = model.info.get('primal_solution_status');
  return status === lp.constants.solutionStatus.feasible ? model.getSolution().colValue : null;
}

export const isOptimal = (lp: LpSolver, model: Model): boolean => model.getModelStatus() === lp.constants.modelStatus.optimal;

const finite = (lp: LpSolver, v: number): number => (v === Infinity ? lp.infinity : v === -Infinity ? -lp.infinity : v);
