import type { CableNet } from './net.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { scratchState, segmentState, strainEnergy, tangentStiffness, verticalPull } from './segment.ts';
import { SkylineCholesky } from './skyline.ts';
import { maxAbs, minimise, type SolveSettings } from './energy-newton.ts';

export type { SolveSettings } from './energy-newton.ts';

// Equilibrium of a cable net under vertical nodal loads, by Newton-Raphson on
// the tangent stiffness with a backtracking line search on the total
// potential energy. The energy is convex in the sags (each segment's energy is
// a convex, non-decreasing function of a length that is convex in them), so
// every Newton direction goes downhill and the search cannot stall short of
// equilibrium. Units: mm and N.

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

/** Stand-in geometric tension for slack segments, as a fraction of EA (only shapes the first steps). */
export const SLACK_TENSION = 1e-6;

const at = (u: ArrayLike<number>, i: number) => (i < 0 ? 0 : u[i]);

/** Internal upward force on each node, and the total strain energy; `flats` the segments' plan lengths where the anchors moved. */
export function internalForces(net: CableNet, sag: ArrayLike<number>, flats?: ArrayLike<number>): { force: Float64Array; energy: number } {
  const force = new Float64Array(net.nodes.length);
  let energy = 0;
  const st = scratchState();
  const segs = net.segments;
  for (let i = 0; i < segs.length; i++) {
    const seg = segs[i];
    segmentState(seg, at(sag, seg.a), at(sag, seg.b), flats ? flats[i] : seg.flat, st);
    const f = verticalPull(st);
    if (seg.a >= 0) force[seg.a] += f;
    if (seg.b >= 0) force[seg.b] -= f;
    energy += strainEnergy(seg, st);
  }
  return { force, energy };
}

/** The tangent stiffness at a state, in a skyline matrix numbered for a small envelope. */
export function tangentMatrix(net: CableNet, matrix?: SkylineCholesky, sag?: ArrayLike<number>, slackFraction = 0, flats?: ArrayLike<number>): SkylineCholesky {
  const K = matrix ?? new SkylineCholesky(net.nodes.length, coupledPairs(net), nodeOrder(net));
  K.zero();
  const u = sag ?? new Float64Array(net.nodes.length);
  const st = scratchState();
  const segs = net.segments;
  for (let i = 0; i < segs.length; i++) {
    const seg = segs[i];
    const k = tangentStiffness(seg, segmentState(seg, at(u, seg.a), at(u, seg.b), flats ? flats[i] : seg.flat, st), slackFraction * seg.EA);
    if (seg.a >= 0) K.add(seg.a, seg.a, k);
    if (seg.b >= 0) K.add(seg.b, seg.b, k);
    if (seg.a >= 0 && seg.b >= 0) K.add(seg.a, seg.b, -k);
  }
  return K;
}

/** `matrix`: a skyline matrix laid out for this net, to reuse its numbering and storage. */
export function solveNet(net: CableNet, loads: ArrayLike<number>, settings: SolveSettings, start?: ArrayLike<number>, matrix?: SkylineCholesky): NetSolution {
  const n = net.nodes.length;
  let K = matrix;
  const m = minimise(
    {
      state: (v) => {
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
      },
      direction: (u, cur) => {
        K = tangentMatrix(net, K, u, SLACK_TENSION);
        if (!K.factor()) return 'the tangent stiffness is not positive definite';
        const step = K.solve(cur.residual);
        let slope = 0; // d(potential)/d(alpha) at alpha = 0: -residual . step
        for (let i = 0; i < n; i++) slope -= cur.residual[i] * step[i];
        return { step, slope };
      },
    },
    Float64Array.from(start ?? new Float64Array(n)),
    settings,
  );
  return { sag: m.x, converged: m.converged, iterations: m.iterations, residual_N: m.state.worst, history: m.history, ...(m.stopped ? { stopped: m.stopped } : {}) };
}
