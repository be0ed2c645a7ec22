import type { DenseLU } from '../floor-frame/dense-lu.ts';
import type { FloorFrame, FrameState } from '../floor-frame/frame-model.ts';
import { solveCoupled, type CoupledSolution } from './coupled-solve.ts';
import { couplingPreconditioner } from './coupled-tangent.ts';
import type { CableNet } from './net.ts';
import type { SkylineCholesky } from './skyline.ts';

// The pretension alone: the net and its frame with no one aboard. It reads
// no crew, so one solve serves every state of a floor setup (the standing
// floor, the loaded states, a sweep's crew moves). Its Newton path does not
// depend on the tolerance (only where it stops), so a solve kept from one
// tolerance is the very solve another would make wherever that one would stop
// at the same step: the first step whose residual is within it is the last.

/** A pretension-alone solve, with the frame under its pulls and the strap system's factor it left behind. */
export interface RestSolve {
  tolerance_N: number;
  maxIterations: number;
  sol: CoupledSolution;
  /** The preconditioner the solve ended with, for the loaded states that follow it. */
  factor: DenseLU | null;
  frame: FrameState;
}

/** Whether a solve made at one tolerance is exactly the solve at `tolerance_N`. */
function serves(kept: RestSolve, tolerance_N: number, maxIterations: number): boolean {
  if (kept.maxIterations !== maxIterations) return false;
  if (kept.tolerance_N === tolerance_N) return true;
  const h = kept.sol.history;
  return kept.sol.converged && h.findIndex((r) => r <= tolerance_N) === h.length - 1;
}

export interface RestInputs {
  net: CableNet;
  F: Float64Array;
  frame: FloorFrame;
}

/** Keeps the last pretension-alone solve of one setup; solves afresh where it would not be the same. */
export class RestMemo {
  #kept: RestSolve | undefined;

  solve(inputs: RestInputs, tolerance_N: number, maxIterations: number, matrix: SkylineCholesky): RestSolve {
    if (this.#kept && serves(this.#kept, tolerance_N, maxIterations)) return this.#kept;
    // A fresh preconditioner, as a solve with nothing before it starts.
    const coupling = couplingPreconditioner();
    const sol = solveCoupled(inputs.net, new Float64Array(inputs.net.nodes.length), inputs.F, { tolerance_N, maxIterations }, undefined, { matrix, coupling });
    this.#kept = { tolerance_N, maxIterations, sol, factor: coupling.factor, frame: inputs.frame.solve(sol.pulls) };
    return this.#kept;
  }
}
