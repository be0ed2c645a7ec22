import type { CableNet } from './net.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { segmentState, strainEnergy, tangentStiffness, verticalPull } from './segment.ts';
import { SkylineCholesky } from './skyline.ts';

// Equilibrium of a cable net under vertical nodal loads, by Newton-Raphson on
// the tangent stiffness with a backtracking line search on the total
// potential energy. The energy is convex in the sags (each segment's energy is
// a convex, non-decreasing function of a length that is convex in them), so
// every Newton direction goes downhill and the search cannot stall short of
// equilibrium. Units: mm and N.

export interface SolveSettings {
  /** Converged when no node is out of balance by more than this, N. */
  tolerance_N: number;
  maxIterations: number;
}

export interface NetSolution {
  /** Sag of each node, mm (positive down). */
  sag: Float64Array;
  converged: boolean;
  /** Newton steps taken. */
  iterations: number;
  /** Largest out-of-balance nodal force at the end, N. */
  residual_N: number;
  /** The residual before the first step and after each one, N. */
  history: number[];
  /** Why it stopped short, when it did. */
  stopped?: string;
}

const ARMIJO = 1e-4;
const MAX_BACKTRACKS = 60;
/** Stand-in geometric tension for slack segments, as a fraction of EA (only shapes the first steps). */
export const SLACK_TENSION = 1e-6;

const at = (u: ArrayLike<number>, i: number) => (i < 0 ? 0 : u[i]);

/** Internal upward force on each node, and the total strain energy. */
export function internalForces(net: CableNet, sag: ArrayLike<number>): { force: Float64Array; energy: number } {
  const force = new Float64Array(net.nodes.length);
  let energy = 0;
  for (const seg of net.segments) {
    const st = segmentState(seg, at(sag, seg.a), at(sag, seg.b));
    const f = verticalPull(st);
    if (seg.a >= 0) force[seg.a] += f;
    if (seg.b >= 0) force[seg.b] -= f;
    energy += strainEnergy(seg, st);
  }
  return { force, energy };
}

/** The tangent stiffness at a state, in a skyline matrix numbered for a small envelope. */
export function tangentMatrix(net: CableNet, matrix?: SkylineCholesky, sag?: ArrayLike<number>, slackFraction = 0): SkylineCholesky {
  const K = matrix ?? new SkylineCholesky(net.nodes.length, coupledPairs(net), nodeOrder(net));
  K.zero();
  const u = sag ?? new Float64Array(net.nodes.length);
  for (const seg of net.segments) {
    const k = tangentStiffness(seg, segmentState(seg, at(u, seg.a), at(u, seg.b)), slackFraction * seg.EA);
    if (seg.a >= 0) K.add(seg.a, seg.a, k);
    if (seg.b >= 0) K.add(seg.b, seg.b, k);
    if (seg.a >= 0 && seg.b >= 0) K.add(seg.a, seg.b, -k);
  }
  return K;
}

function maxAbs(v: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) m = Math.max(m, Math.abs(v[i]));
  return m;
}

export function solveNet(net: CableNet, loads: ArrayLike<number>, settings: SolveSettings, start?: ArrayLike<number>): NetSolution {
  const n = net.nodes.length;
  let u = Float64Array.from(start ?? new Float64Array(n));
  const state = (v: Float64Array) => {
    const { force, energy } = internalForces(net, v);
    let work = 0;
    let scale = energy;
    const residual = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      residual[i] = loads[i] - force[i];
      work += loads[i] * v[i];
      scale += Math.abs(loads[i] * v[i]);
    }
    return { residual, potential: energy - work, scale, worst: maxAbs(residual) };
  };
  let cur = state(u);
  const history = [cur.worst];
  let K: SkylineCholesky | undefined;
  let iterations = 0;
  let stopped: string | undefined;
  while (cur.worst > settings.tolerance_N && iterations < settings.maxIterations) {
    K = tangentMatrix(net, K, u, SLACK_TENSION);
    if (!K.factor()) {
      stopped = 'the tangent stiffness is not positive definite';
      break;
    }
    const step = K.solve(cur.residual);
    let slope = 0; // d(potential)/d(alpha) at alpha = 0: -residual . step
    for (let i = 0; i < n; i++) slope -= cur.residual[i] * step[i];
    let alpha = 1;
    let trial: ReturnType<typeof state> | undefined;
    let next = u;
    for (let b = 0; b < MAX_BACKTRACKS; b++) {
      next = u.map((v, i) => v + alpha * step[i]);
      trial = state(next);
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
    u = next;
    cur = trial;
    history.push(cur.worst);
  }
  const converged = cur.worst <= settings.tolerance_N;
  if (!converged && !stopped) stopped = `no convergence in ${settings.maxIterations} iterations`;
  return { sag: u, converged, iterations, residual_N: cur.worst, history, ...(converged ? {} : { stopped }) };
}
