import { maxAbs, minimise, type EnergyProblem, type SolveSettings } from './energy-newton.ts';
import type { CableNet, Segment } from './net.ts';
import { horizontalPull, scratchState, segmentState, strainEnergy, verticalPull, type SegmentState } from './segment.ts';
import { coupledTangent, couplingPreconditioner, mulF, type CouplingPreconditioner } from './coupled-tangent.ts';
import { SkylineCholesky } from './skyline.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { SLACK_TENSION, solveNet, type NetSolution } from './solve-net.ts';

// The net and its frame solved together. The frame, bending in its plane,
// lets each strap's anchors move in by e_s (its shortening), and the strap's
// plan length L_s shrinks to L_s − e_s, spread evenly over its segments
// (each segment's plan length × (1 − e_s/L_s); nodes still move only
// vertically). Its unstretched lengths stay as cut for T_0 on rigid anchors,
// so the pretension is an imposed strain that relaxes as the rails bow.
//
// The frame enters through its flexibility F (F[s][t]: the shortening of
// strap s under a unit pull of strap t), with e = F·λ for the pulls λ the
// frame carries. The unknowns are the sags u and the pulls λ; the total
// potential
//   Π(u, λ) = Σ U_segment(u, e) + ½ λ·F·λ − P·u,   e = F·λ,
// is convex (each segment's energy is a convex, non-decreasing function of a
// length that is the norm of an affine function of u and e), stationary
// where every node balances and λ equals each strap's mean pull H̄_s (the
// flat-weighted mean of its segments' horizontal tensions, the force that
// does work on e_s). Newton's method on Π with the line search: the step
// eliminates u with the net's tangent (skyline Cholesky) and solves the
// strap-sized system (S·F + I)·Δλ = (H̄ − λ) − Xᵀ r_u, with X = K_uu⁻¹ K_ue
// and S = K_ee − K_ueᵀ X, which needs no inverse of F and tends to the net on
// fixed anchors as F → 0. Converged when no node and no strap pull is out
// of balance by more than the tolerance, N.

export interface CoupledSolution extends NetSolution {
  /** Each strap's pull on its two anchors as the frame carries it, N. */
  pulls: Float64Array;
  /** Each strap's shortening from its anchors' movement, mm. */
  shortening: Float64Array;
  /** The segments' plan lengths after the anchors moved, mm. */
  flats: Float64Array;
}

const at = (u: ArrayLike<number>, i: number) => (i < 0 ? 0 : u[i]);

/** Each strap's plan length from end to end, mm. */
export function strapSpans(net: CableNet): Float64Array {
  return Float64Array.from(net.straps, (s) => s.points[s.points.length - 1].s - s.points[0].s);
}

/** The segments' plan lengths with each strap shortened by e_s, spread evenly. */
export function planLengths(net: CableNet, e: ArrayLike<number>, spans: ArrayLike<number>): Float64Array {
  const segs = net.segments;
  const flats = new Float64Array(segs.length);
  for (let i = 0; i < segs.length; i++) flats[i] = segs[i].flat * (1 - e[segs[i].strap] / spans[segs[i].strap]);
  return flats;
}

/** Every segment's state at the sags u and plan lengths `flats` (the segments' own where omitted); `into`: states to fill again. */
export function netStates(net: CableNet, u: ArrayLike<number>, flats?: ArrayLike<number>, into?: SegmentState[]): SegmentState[] {
  return net.segments.map((seg, i) => segmentState(seg, at(u, seg.a), at(u, seg.b), flats ? flats[i] : seg.flat, into?.[i]));
}

interface CoupledState {
  potential: number;
  scale: number;
  worst: number;
  residual: Float64Array;
  /** H̄ − λ, N. */
  pullGap: Float64Array;
  flats: Float64Array;
  e: Float64Array;
}

/** A segment's part of its strap's mean pull: its horizontal tension weighted by its share of the strap's span. */
const meanPullShare = (seg: Segment, st: SegmentState, spans: ArrayLike<number>) => (horizontalPull(st) * seg.flat) / spans[seg.strap];

/** Each strap's mean pull H̄_s: its segments' horizontal tensions T·f/l weighted by their share of its span. */
export function meanPulls(net: CableNet, states: readonly SegmentState[], spans: ArrayLike<number>): Float64Array {
  const H = new Float64Array(net.straps.length);
  net.segments.forEach((seg, i) => (H[seg.strap] += meanPullShare(seg, states[i], spans)));
  return H;
}

/**
 * How exactly a Newton step solves its strap system (GMRES's relative residual). An inexact step converges at
 * this rate at worst (Dembo, Eisenstat & Steihaug, SIAM J. Numer. Anal. 19 (1982) 400-408), far below the steady
 * rate where segments end just slack: the demo floors take the exact step's steps. Relative only, so the path does
 * not depend on the tolerance it stops at.
 */
const STEP_ACCURACY = 1e-4;

/** Storage shared by the solves of one net: its skyline matrix (numbering and storage) and the strap system's preconditioner. */
export interface CoupledWorkspace {
  matrix?: SkylineCholesky;
  coupling?: CouplingPreconditioner;
}

export function solveCoupled(net: CableNet, loads: ArrayLike<number>, F: ArrayLike<number>, settings: SolveSettings, from?: { sag: ArrayLike<number>; pulls: ArrayLike<number> }, workspace: CoupledWorkspace = {}): CoupledSolution {
  const n = net.nodes.length;
  const m = net.straps.length;
  const spans = strapSpans(net);
  const K = workspace.matrix ?? new SkylineCholesky(n, coupledPairs(net), nodeOrder(net));
  const coupling = workspace.coupling ?? couplingPreconditioner();
  const segs = net.segments;
  const st = scratchState();
  // The forces and mean pulls are summed afresh into the same storage at every state (a state keeps neither).
  const force = new Float64Array(n);
  const H = new Float64Array(m);
  const state = (x: Float64Array): CoupledState => {
    const lambda = x.subarray(n);
    const e = mulF(F, lambda, m);
    const flats = planLengths(net, e, spans);
    force.fill(0);
    H.fill(0);
    let energy = 0;
    // One pass over the segments, filling one scratch state: forces, energy and mean pulls together.
    for (let i = 0; i < segs.length; i++) {
      const seg = segs[i];
      segmentState(seg, at(x, seg.a), at(x, seg.b), flats[i], st);
      const f = verticalPull(st);
      if (seg.a >= 0) force[seg.a] += f;
      if (seg.b >= 0) force[seg.b] -= f;
      energy += strainEnergy(seg, st);
      H[seg.strap] += meanPullShare(seg, st, spans);
    }
    let frame = 0;
    for (let s = 0; s < m; s++) frame += 0.5 * lambda[s] * e[s];
    let work = 0;
    let scale = energy + frame;
    const residual = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      residual[i] = loads[i] - force[i];
      work += loads[i] * x[i];
      scale += Math.abs(loads[i] * x[i]);
    }
    const pullGap = new Float64Array(m);
    for (let s = 0; s < m; s++) pullGap[s] = H[s] - lambda[s];
    return {
      potential: energy + frame - work,
      scale,
      worst: Math.max(maxAbs(residual), maxAbs(pullGap)),
      residual,
      pullGap,
      flats,
      e,
    };
  };
  // Each step's segment states, filled again at every step: its tangent is used up within the step.
  const stepStates = segs.map(() => scratchState());
  const problem: EnergyProblem<CoupledState> = {
    state,
    direction: (x, cur) => {
      // Slack segments get only the tiny stand-in, not their pretension's geometric stiffness: the step is then Newton's
      // own and converges quadratically where segments end slack (the line search on the energy keeps it safe).
      const T = coupledTangent(net, F, spans, netStates(net, x, cur.flats, stepStates), K, SLACK_TENSION, 0, coupling);
      if (!T) return 'the tangent stiffness is not positive definite';
      const d = T.solve(cur.residual, cur.pullGap, STEP_ACCURACY);
      if (!d) return 'the coupled step could not be solved';
      // Slope of Π along the step: −r_u·Δu − (F·(H̄ − λ))·Δλ.
      const FrH = mulF(F, cur.pullGap, m);
      let slope = 0;
      for (let i = 0; i < n; i++) slope -= cur.residual[i] * d.du[i];
      for (let s = 0; s < m; s++) slope -= FrH[s] * d.dl[s];
      const step = new Float64Array(n + m);
      step.set(d.du);
      step.set(d.dl, n);
      return { step, slope };
    },
  };
  // Without a start given: the sags on rigid anchors (a quick solve) and the pulls they put on the anchors. The floor model
  // starts closer: the same sags with the pulls of the pretension alone solved with the frame (far fewer steps).
  const start = new Float64Array(n + m);
  const sag = from?.sag ?? solveNet(net, loads, settings).sag;
  start.set(sag);
  start.set(from?.pulls ?? meanPulls(net, netStates(net, sag), spans), n);
  const result = minimise(problem, start, settings);
  const x = result.x;
  return {
    sag: x.slice(0, n),
    pulls: x.slice(n),
    shortening: result.state.e,
    flats: result.state.flats,
    converged: result.converged,
    iterations: result.iterations,
    residual_N: result.state.worst,
    history: result.history,
    ...(result.stopped ? { stopped: result.stopped } : {}),
  };
}
