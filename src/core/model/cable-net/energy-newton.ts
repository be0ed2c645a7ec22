// Newton's method on a convex potential, with a backtracking (Armijo) line
// search on the potential itself: each step is accepted only where it lowers
// the energy enough, so the iteration cannot wander off. Shared by the net on
// fixed anchors and the net coupled to its frame. Converged when the largest
// out-of-balance force is within the tolerance.

export interface SolveSettings {
  /** Converged when no node is out of balance by more than this, N. */
  tolerance_N: number;
  maxIterations: number;
}

export interface EnergyState {
  potential: number;
  /** Size of the energies summed, for the rounding allowance. */
  scale: number;
  /** Largest out-of-balance force, N. */
  worst: number;
}

export interface EnergyProblem<S extends EnergyState> {
  /** The state at x; it must not keep x (its storage is filled again with later trial points). */
  state(x: Float64Array): S;
  /** The Newton step from x and the potential's slope along it, or why there is none. */
  direction(x: Float64Array, s: S): { step: Float64Array; slope: number } | string;
}

export interface Minimum<S extends EnergyState> {
  x: Float64Array;
  state: S;
  converged: boolean;
  iterations: number;
  history: number[];
  stopped?: string;
}

const ARMIJO = 1e-4;
const MAX_BACKTRACKS = 60;

export function minimise<S extends EnergyState>(problem: EnergyProblem<S>, start: Float64Array, settings: SolveSettings): Minimum<S> {
  let x = start;
  let spare: Float64Array = new Float64Array(x.length);
  let cur = problem.state(x);
  const history = [cur.worst];
  let iterations = 0;
  let stopped: string | undefined;
  while (cur.worst > settings.tolerance_N && iterations < settings.maxIterations) {
    const dir = problem.direction(x, cur);
    if (typeof dir === 'string') {
      stopped = dir;
      break;
    }
    const { step, slope } = dir;
    let alpha = 1;
    let trial: S | undefined;
    // The trial point fills one spare vector, backtrack after backtrack (a state keeps no reference to its point).
    const next = spare;
    for (let b = 0; b < MAX_BACKTRACKS; b++) {
      for (let i = 0; i < x.length; i++) next[i] = x[i] + alpha * step[i];
      trial = problem.state(next);
      // Near equilibrium the energy change falls to rounding level; allow for it.
      if (trial.potential <= cur.potential + ARMIJO * alpha * slope + 1e-13 * (cur.scale + trial.scale)) break;
      const curvature = trial.potential - cur.potential - slope * alpha;
      const guess = curvature > 0 ? (-slope * alpha * alpha) / (2 * curvature) : 0.5 * alpha;
      alpha = Math.min(0.5 * alpha, Math.max(0.1 * alpha, guess));
      trial = undefined;
    }
    iterations++;
    if (!trial) {
      stopped = 'the line search found no step that lowers the energy';
      break;
    }
    // The point left behind is the next spare, unless it is the caller's start (left as given).
    spare = x === start ? new Float64Array(x.length) : x;
    x = next;
    cur = trial;
    history.push(cur.worst);
  }
  const converged = cur.worst <= settings.tolerance_N;
  if (!converged && !stopped) stopped = `no convergence in ${settings.maxIterations} iterations`;
  return { x, state: cur, converged, iterations, history, ...(converged ? {} : { stopped }) };
}

export function maxAbs(v: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) m = Math.max(m, Math.abs(v[i]));
  return m;
}
