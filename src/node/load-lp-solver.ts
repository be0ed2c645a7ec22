import loadHighs from 'highs';
import type { LpSolver } from '../core/stock/cutting-types.ts';

// HiGHS (WebAssembly) compiles once per process; every caller shares it. The
// core reads no clock, so the planner's time limits read the one given here.
let solver: Promise<LpSolver> | undefined;

export function loadLpSolver(): Promise<LpSolver> {
  solver ??= loadHighs().then((highs) => Object.assign(highs, { now: () => performance.now() }));
  return solver;
}
