// A typed door to the odex package (Hairer and Wanner's extrapolation
// integrator, ported to JavaScript), used as the independent reference for
// the ride model. odex ships no type declarations and its .ts source fails
// strict checking, so it is loaded through createRequire behind this module.
import { createRequire } from 'node:module';

export interface OdexOptions {
  relativeTolerance: number;
  absoluteTolerance: number;
  maxSteps?: number;
  /** Called at evenly spaced times with the state there (dense output). */
  grid?: { interval: number; at(t: number, y: number[]): void };
  /** Called after every accepted step from t0 to t1 with the state at t1 and the step's dense output (component i at time t); in place of grid. */
  steps?: (t0: number, t1: number, y: number[], dense: (i: number, t: number) => number) => void;
}

export interface OdexResult {
  y: number[];
  /** 0 converged, 1 too many steps, 2 stopped early. */
  outcome: number;
  nStep: number;
  nAccept: number;
  nReject: number;
  nEval: number;
}

interface SolverInstance {
  relativeTolerance: number;
  absoluteTolerance: number;
  maxSteps: number;
  denseOutput: boolean;
  solve(f: (t: number, y: number[]) => number[], t0: number, y0: number[], t1: number, out?: unknown): OdexResult;
  grid(dt: number, cb: (t: number, y: number[]) => void): unknown;
}

const odex = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => SolverInstance };

export function odexSolve(f: (t: number, y: number[]) => number[], t0: number, y0: readonly number[], t1: number, o: OdexOptions): OdexResult {
  const s = new odex.Solver(y0.length);
  s.relativeTolerance = o.relativeTolerance;
  s.absoluteTolerance = o.absoluteTolerance;
  s.maxSteps = o.maxSteps ?? 1_000_000;
  s.denseOutput = o.grid !== undefined || o.steps !== undefined;
  const each = o.steps;
  // The first call is the starting point, with no step and no dense output.
  const out = each ? (n: number, t0: number, t1: number, y: number[], dense: (i: number, t: number) => number) => void (n > 1 && each(t0, t1, y, dense)) : o.grid ? s.grid(o.grid.interval, (t, y) => o.grid!.at(t, y)) : undefined;
  const r = s.solve(f, t0, [...y0], t1, out);
  if (r.outcome !== 0) throw new Error(`odex stopped before the end (outcome ${r.outcome} after ${r.nStep} steps)`);
  return r;
}
