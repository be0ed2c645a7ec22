import { solveDense } from '../floor-frame/dense-lu.ts';
import { maxAbs, minimise, type EnergyProblem, type SolveSettings } from './energy-newton.ts';
import type { CableNet } from './net.ts';
import { planCurvatures, segmentState, strainEnergy, tangentStiffness, verticalPull, type SegmentState } from './segment.ts';
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
  return Float64Array.from(net.segments, (seg) => seg.flat * (1 - e[seg.strap] / spans[seg.strap]));
}

function mulF(F: ArrayLike<number>, x: ArrayLike<number>, m: number): Float64Array {
  const y = new Float64Array(m);
  for (let s = 0; s < m; s++) {
    let v = 0;
    for (let t = 0; t < m; t++) v += F[s * m + t] * x[t];
    y[s] = v;
  }
  return y;
}

interface CoupledState {
  potential: number;
  scale: number;
  worst: number;
  residual: Float64Array;
  /** H̄ − λ, N. */
  pullGap: Float64Array;
  states: SegmentState[];
  flats: Float64Array;
  e: Float64Array;
}

/** The linearised coupled system at a state: solves for (Δu, Δλ) given the node and pull residuals. */
export interface CoupledTangent {
  solve(ru: ArrayLike<number>, rH: ArrayLike<number>): { du: Float64Array; dl: Float64Array } | null;
}

/** Assemble and factor the coupled tangent; null where the net's tangent is not positive definite. */
export function coupledTangent(net: CableNet, F: ArrayLike<number>, spans: ArrayLike<number>, states: readonly SegmentState[], K: SkylineCholesky, slackFraction: number, slackPretension = 1): CoupledTangent | null {
  const n = net.nodes.length;
  const m = net.straps.length;
  K.zero();
  const Kee = new Float64Array(m);
  const cols: { node: number; v: number }[][] = net.straps.map(() => []);
  net.segments.forEach((seg, i) => {
    const st = states[i];
    // A slack segment stands in with the geometric stiffness of its pretension: it only shapes the step (the energy
    // decides it), and keeps a node hanging on slack straps from being thrown far. A taut one is exact.
    const standIn = st.tension > 0 ? 0 : Math.max(slackFraction * seg.EA, slackPretension * ((seg.EA * (seg.flat - seg.rest)) / seg.rest));
    const k = tangentStiffness(seg, st, standIn);
    if (seg.a >= 0) K.add(seg.a, seg.a, k);
    if (seg.b >= 0) K.add(seg.b, seg.b, k);
    if (seg.a >= 0 && seg.b >= 0) K.add(seg.a, seg.b, -k);
    const c = planCurvatures(seg, st);
    const df = -seg.flat / spans[seg.strap]; // d(plan length)/d(e_s)
    Kee[seg.strap] += c.ff * df * df;
    if (seg.a >= 0) cols[seg.strap].push({ node: seg.a, v: c.fd * df });
    if (seg.b >= 0) cols[seg.strap].push({ node: seg.b, v: -c.fd * df });
  });
  if (!K.factor()) return null;
  const X = cols.map((col) => {
    const b = new Float64Array(n);
    for (const { node, v } of col) b[node] += v;
    return K.solve(b);
  });
  const dotCol = (s: number, v: ArrayLike<number>) => cols[s].reduce((sum, { node, v: c }) => sum + c * v[node], 0);
  const S = new Float64Array(m * m);
  for (let s = 0; s < m; s++) for (let t = 0; t < m; t++) S[s * m + t] = (s === t ? Kee[s] : 0) - dotCol(s, X[t]);
  // A = S·F + I.
  const A = new Float64Array(m * m);
  for (let s = 0; s < m; s++) {
    for (let t = 0; t < m; t++) {
      let v = s === t ? 1 : 0;
      for (let k = 0; k < m; k++) v += S[s * m + k] * F[k * m + t];
      A[s * m + t] = v;
    }
  }
  return {
    solve(ru, rH) {
      const y = K.solve(ru);
      const rhs = Float64Array.from(rH, (r, s) => r - dotCol(s, y));
      const dl = solveDense(A, rhs, m);
      if (!dl) return null;
      const Fdl = mulF(F, dl, m);
      const du = y.map((v, i) => v - X.reduce((sum, x, t) => sum + x[i] * Fdl[t], 0));
      return { du, dl };
    },
  };
}

/** Each strap's mean pull H̄_s: its segments' horizontal tensions T·f/l weighted by their share of its span. */
export function meanPulls(net: CableNet, states: readonly SegmentState[], spans: ArrayLike<number>): Float64Array {
  const H = new Float64Array(net.straps.length);
  net.segments.forEach((seg, i) => {
    const st = states[i];
    H[seg.strap] += (st.tension * st.flat * seg.flat) / (st.length * spans[seg.strap]);
  });
  return H;
}

export function solveCoupled(net: CableNet, loads: ArrayLike<number>, F: ArrayLike<number>, settings: SolveSettings, from?: { sag: ArrayLike<number>; pulls: ArrayLike<number> }): CoupledSolution {
  const n = net.nodes.length;
  const m = net.straps.length;
  const spans = strapSpans(net);
  const K = new SkylineCholesky(n, coupledPairs(net), nodeOrder(net));
  const state = (x: Float64Array): CoupledState => {
    const lambda = x.subarray(n);
    const e = mulF(F, lambda, m);
    const flats = planLengths(net, e, spans);
    const force = new Float64Array(n);
    let energy = 0;
    const states = net.segments.map((seg, i) => {
      const st = segmentState(seg, at(x, seg.a), at(x, seg.b), flats[i]);
      const f = verticalPull(st);
      if (seg.a >= 0) force[seg.a] += f;
      if (seg.b >= 0) force[seg.b] -= f;
      energy += strainEnergy(seg, st);
      return st;
    });
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
    const H = meanPulls(net, states, spans);
    const pullGap = H.map((h, s) => h - lambda[s]);
    return {
      potential: energy + frame - work,
      scale,
      worst: Math.max(maxAbs(residual), maxAbs(pullGap)),
      residual,
      pullGap,
      states,
      flats,
      e,
    };
  };
  const problem: EnergyProblem<CoupledState> = {
    state,
    direction: (_x, cur) => {
      const T = coupledTangent(net, F, spans, cur.states, K, SLACK_TENSION);
      if (!T) return 'the tangent stiffness is not positive definite';
      const d = T.solve(cur.residual, cur.pullGap);
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
  start.set(from?.pulls ?? meanPulls(net, net.segments.map((seg) => segmentState(seg, at(sag, seg.a), at(sag, seg.b))), spans), n);
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
