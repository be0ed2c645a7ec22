import loadHighs from 'highs';
import type { LpSolver } from '../core/stock/cutting-types.ts';

// HiGHS (WebAssembly) compiles once per process; every caller shares it.
let solver: Promise<LpSolver> | undefined;

export function loadLpSolver(): Promise<LpSolver> {
  solver ??= loadHighs();
  return solver;
}
