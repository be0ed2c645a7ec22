import { factorDense, type DenseLU } from '../floor-frame/dense-lu.ts';
import { squareTimesVector } from '../../numeric/square-times-vector.ts';
import { gmres } from './gmres.ts';
import type { CableNet } from './net.ts';
import { planCurvatures, tangentStiffness, type SegmentState } from './segment.ts';
import type { SkylineCholesky } from './skyline.ts';

// The linearised net-and-frame system of coupled-solve.ts at one state. With
// K_uu factored (skyline Cholesky), a step solves the strap-sized system
// (S·F + I)·Δλ = r_λ − K_ueᵀ·K_uu⁻¹·r_u with the Schur complement
// S = K_ee − K_ueᵀ·K_uu⁻¹·K_ue, then Δu = K_uu⁻¹·(r_u − K_ue·F·Δλ).
// Forming S costs a forward sweep per strap and a dot product per pair of
// straps over the whole net, many times a net solve; so S is not formed at
// every step. The strap system is solved by GMRES (gmres.ts), each of its
// products (S·F + I)·v one net solve, preconditioned with the factor of
// S·F + I from an earlier step or state (`CouplingPreconditioner`): S changes
// little from step to step, and a few products reach the exact step. Only
// where that fails (no earlier factor, or GMRES not converged within its
// steps) is this state's S formed and factored, and it is kept for the steps
// after. Each column of K_ue holds one strap's nodes only: its forward solve
// starts at the first of them.

/** The linearised coupled system at a state: solves for (Δu, Δλ) given the node and pull residuals. */
export interface CoupledTangent {
  /**
   * `accuracy`: how exactly GMRES solves the strap system, its residual relative to its right-hand side's
   * (never past a direct solve's rounding; and to that rounding where no net solve is needed, as it costs little).
   */
  solve(ru: ArrayLike<number>, rH: ArrayLike<number>, accuracy?: number): { du: Float64Array; dl: Float64Array } | null;
}

/** The factor of S·F + I at an earlier state, shared by the solves of one net to precondition their steps. */
export interface CouplingPreconditioner {
  factor: DenseLU | null;
  /** How often S was formed and factored, and the GMRES products taken (for tests and profiling). */
  formed: number;
  products: number;
}

export function couplingPreconditioner(): CouplingPreconditioner {
  return { factor: null, formed: 0, products: 0 };
}

/** GMRES's tightest relative tolerance, and its tolerance unless the caller asks for less: a direct solve's, near enough. */
const GMRES_TOLERANCE = 1e-10;
/** GMRES steps before a fresh S is cheaper (forming it costs some tens of net solves). */
const GMRES_STEPS = 16;

/** y = F·x for the row-major m × m flexibility. */
export const mulF = squareTimesVector;

/** K_ue as entries: two per segment (its ends' rows in the stored numbering; a fixed end holds 0), each in one strap's column. */
interface Coupling {
  row: Int32Array;
  strap: Int32Array;
  value: Float64Array;
  Kee: Float64Array;
}

/** z += K_ue·w, z in the stored numbering. */
function spread(c: Coupling, w: ArrayLike<number>, z: Float64Array): void {
  for (let k = 0; k < c.row.length; k++) z[c.row[k]] += c.value[k] * w[c.strap[k]];
}

/** t += K_ueᵀ·z. */
function gather(c: Coupling, z: Float64Array, t: Float64Array): void {
  for (let k = 0; k < c.row.length; k++) t[c.strap[k]] += c.value[k] * z[c.row[k]];
}

/** S·F + I formed: W = L⁻¹·K_ue a column at a time from its first row, S = K_ee − Wᵀ·W. */
function schurSystem(c: Coupling, K: SkylineCholesky, F: ArrayLike<number>, m: number): Float64Array {
  const n = K.n;
  const W = new Float64Array(m * n);
  const from = new Int32Array(m).fill(n);
  for (let k = 0; k < c.row.length; k++) {
    // A flat strap (the pretension alone) has no coupling: its column stays empty and costs nothing.
    if (c.value[k] === 0) continue;
    const s = c.strap[k];
    W[s * n + c.row[k]] += c.value[k];
    if (c.row[k] < from[s]) from[s] = c.row[k];
  }
  for (let s = 0; s < m; s++) if (from[s] < n) K.forward(W.subarray(s * n, (s + 1) * n), from[s]);
  const S = new Float64Array(m * m);
  for (let s = 0; s < m; s++) {
    for (let t = 0; t <= s; t++) {
      let v = 0;
      for (let k = Math.max(from[s], from[t]), a = s * n, b = t * n; k < n; k++) v += W[a + k] * W[b + k];
      S[s * m + t] = S[t * m + s] = (s === t ? c.Kee[s] : 0) - v;
    }
  }
  // A = S·F + I a row at a time, each entry's terms added in the same order as a dot product would; a zero of S
  // (every off-diagonal one where nothing couples the net, as under the pretension alone) adds nothing and is skipped.
  const A = new Float64Array(m * m);
  for (let s = 0; s < m; s++) {
    const row = s * m;
    A[row + s] = 1;
    for (let k = 0; k < m; k++) {
      const v = S[row + k];
      if (v === 0) continue;
      for (let t = 0, f = k * m; t < m; t++) A[row + t] += v * F[f + t];
    }
  }
  return A;
}

/** Assemble the coupled tangent and factor its net part; null where the net's tangent is not positive definite. */
export function coupledTangent(
  net: CableNet,
  F: ArrayLike<number>,
  spans: ArrayLike<number>,
  states: readonly SegmentState[],
  K: SkylineCholesky,
  slackFraction: number,
  slackPretension = 1,
  kept: CouplingPreconditioner = couplingPreconditioner(),
): CoupledTangent | null {
  const n = net.nodes.length;
  const m = net.straps.length;
  const segs = net.segments;
  const place = K.order;
  const c: Coupling = { row: new Int32Array(2 * segs.length), strap: new Int32Array(2 * segs.length), value: new Float64Array(2 * segs.length), Kee: new Float64Array(m) };
  let coupled = false;
  const curv = { ff: 0, fd: 0 };
  for (let i = 0; i < segs.length; i++) {
    const seg = segs[i];
    planCurvatures(seg, states[i], curv);
    const df = -seg.flat / spans[seg.strap]; // d(plan length)/d(e_s)
    c.Kee[seg.strap] += curv.ff * df * df;
    c.strap[2 * i] = c.strap[2 * i + 1] = seg.strap;
    if (seg.a >= 0) {
      c.row[2 * i] = place[seg.a];
      c.value[2 * i] = curv.fd * df;
    }
    if (seg.b >= 0) {
      c.row[2 * i + 1] = place[seg.b];
      c.value[2 * i + 1] = -curv.fd * df;
    }
    if (curv.fd !== 0) coupled = true;
  }
  // The net part, assembled and factored once it is needed: a flat net (the pretension alone, no load) never needs it.
  let factored: boolean | undefined;
  const netPart = (): boolean => {
    if (factored !== undefined) return factored;
    K.zero();
    for (let i = 0; i < segs.length; i++) {
      const seg = segs[i];
      const st = states[i];
      // A slack segment stands in with a small geometric stiffness: it only shapes the step (the energy decides it).
      const standIn = st.tension > 0 ? 0 : Math.max(slackFraction * seg.EA, slackPretension * ((seg.EA * (seg.flat - seg.rest)) / seg.rest));
      const k = tangentStiffness(seg, st, standIn);
      if (seg.a >= 0) K.add(seg.a, seg.a, k);
      if (seg.b >= 0) K.add(seg.b, seg.b, k);
      if (seg.a >= 0 && seg.b >= 0) K.add(seg.a, seg.b, -k);
    }
    return (factored = K.factor());
  };
  if (coupled && !netPart()) return null;
  const solveK = (y: Float64Array) => {
    K.forward(y);
    K.backward(y);
  };
  // (S·F + I)·v with one net solve (none where nothing couples the net to the pulls).
  const z = new Float64Array(n);
  const apply = (v: Float64Array, out: Float64Array) => {
    const w = mulF(F, v, m);
    if (coupled) {
      z.fill(0);
      spread(c, w, z);
      solveK(z);
      gather(c, z, out);
    }
    for (let s = 0; s < m; s++) out[s] = c.Kee[s] * w[s] - out[s] + v[s];
    kept.products++;
  };
  // This state's own factor, formed only where the kept one does not serve; undefined until then.
  let own: DenseLU | null | undefined;
  const strapStep = (rhs: Float64Array, accuracy: number): Float64Array | null => {
    const prior = kept.factor;
    if (own === undefined && prior) {
      const relativeTolerance = coupled ? Math.max(GMRES_TOLERANCE, accuracy) : GMRES_TOLERANCE;
      const g = gmres(m, apply, rhs, { relativeTolerance, maxIterations: GMRES_STEPS }, (v, out) => out.set(prior.solve(v)));
      if (g.converged) return g.x;
    }
    if (own === undefined) {
      own = factorDense(schurSystem(c, K, F, m), m);
      kept.formed++;
      if (own) kept.factor = own;
    }
    return own ? own.solve(rhs) : null;
  };
  return {
    solve(ru, rH, accuracy = GMRES_TOLERANCE) {
      // y = K_uu⁻¹·r_u (stored numbering), zero without a net residual.
      const y = new Float64Array(n);
      let loaded = false;
      for (let i = 0; i < n; i++) if ((y[place[i]] = ru[i]) !== 0) loaded = true;
      if (loaded) {
        if (!netPart()) return null;
        solveK(y);
      }
      const rhs = new Float64Array(m);
      if (coupled) gather(c, y, rhs);
      for (let s = 0; s < m; s++) rhs[s] = rH[s] - rhs[s];
      const dl = strapStep(rhs, accuracy);
      if (!dl) return null;
      // Δu = y − K_uu⁻¹·K_ue·F·Δλ.
      if (coupled) {
        z.fill(0);
        spread(c, mulF(F, dl, m), z);
        solveK(z);
        for (let r = 0; r < n; r++) y[r] -= z[r];
      }
      const du = new Float64Array(n);
      for (let i = 0; i < n; i++) du[i] = y[place[i]];
      return { du, dl };
    },
  };
}
