import { solveDense } from '../floor-frame/dense-lu.ts';
import type { CableNet } from './net.ts';
import { planCurvatures, tangentStiffness, type SegmentState } from './segment.ts';
import type { SkylineCholesky } from './skyline.ts';

// The linearised net-and-frame system of coupled-solve.ts at one state. With
// K_uu = L·Lᵀ (skyline Cholesky) and W = L⁻¹·K_ue, the strap-sized Schur
// complement is S = K_ee − Wᵀ·W, and a step solves (S·F + I)·Δλ = r_λ − Wᵀ·L⁻¹·r_u,
// then Δu = L⁻ᵀ·(L⁻¹·r_u − W·F·Δλ). Each column of K_ue holds one strap's
// nodes only, so its forward solve starts at the first of them: W costs one
// forward sweep per strap from there, no back sweeps, and nothing is stored
// twice.

/** The linearised coupled system at a state: solves for (Δu, Δλ) given the node and pull residuals. */
export interface CoupledTangent {
  solve(ru: ArrayLike<number>, rH: ArrayLike<number>): { du: Float64Array; dl: Float64Array } | null;
}

/** y = F·x for the row-major m × m flexibility. */
export function mulF(F: ArrayLike<number>, x: ArrayLike<number>, m: number): Float64Array {
  const y = new Float64Array(m);
  for (let s = 0; s < m; s++) {
    let v = 0;
    for (let t = 0; t < m; t++) v += F[s * m + t] * x[t];
    y[s] = v;
  }
  return y;
}

/** Assemble and factor the coupled tangent; null where the net's tangent is not positive definite. */
export function coupledTangent(net: CableNet, F: ArrayLike<number>, spans: ArrayLike<number>, states: readonly SegmentState[], K: SkylineCholesky, slackFraction: number, slackPretension = 1): CoupledTangent | null {
  const n = net.nodes.length;
  const m = net.straps.length;
  K.zero();
  const Kee = new Float64Array(m);
  // Column s of K_ue in the stored numbering, one after another, and the first stored row each one reaches.
  const W = new Float64Array(m * n);
  const from = new Int32Array(m).fill(n);
  const put = (s: number, node: number, v: number) => {
    // A flat strap (the pretension alone) has no coupling: its column stays empty and costs nothing.
    if (v === 0) return;
    const r = K.place(node);
    W[s * n + r] += v;
    if (r < from[s]) from[s] = r;
  };
  net.segments.forEach((seg, i) => {
    const st = states[i];
    // A slack segment stands in with a small geometric stiffness: it only shapes the step (the energy decides it).
    const standIn = st.tension > 0 ? 0 : Math.max(slackFraction * seg.EA, slackPretension * ((seg.EA * (seg.flat - seg.rest)) / seg.rest));
    const k = tangentStiffness(seg, st, standIn);
    if (seg.a >= 0) K.add(seg.a, seg.a, k);
    if (seg.b >= 0) K.add(seg.b, seg.b, k);
    if (seg.a >= 0 && seg.b >= 0) K.add(seg.a, seg.b, -k);
    const c = planCurvatures(seg, st);
    const df = -seg.flat / spans[seg.strap]; // d(plan length)/d(e_s)
    Kee[seg.strap] += c.ff * df * df;
    if (seg.a >= 0) put(seg.strap, seg.a, c.fd * df);
    if (seg.b >= 0) put(seg.strap, seg.b, -c.fd * df);
  });
  if (!K.factor()) return null;
  const col = (s: number) => W.subarray(s * n, (s + 1) * n);
  for (let s = 0; s < m; s++) if (from[s] < n) K.forward(col(s), from[s]);
  const S = new Float64Array(m * m);
  for (let s = 0; s < m; s++) {
    for (let t = 0; t <= s; t++) {
      let v = 0;
      for (let k = Math.max(from[s], from[t]), a = s * n, b = t * n; k < n; k++) v += W[a + k] * W[b + k];
      S[s * m + t] = S[t * m + s] = (s === t ? Kee[s] : 0) - v;
    }
  }
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
      const y = new Float64Array(n);
      for (let i = 0; i < n; i++) y[K.place(i)] = ru[i];
      K.forward(y);
      const rhs = new Float64Array(m);
      for (let s = 0; s < m; s++) {
        let v = 0;
        for (let k = from[s], a = s * n; k < n; k++) v += W[a + k] * y[k];
        rhs[s] = rH[s] - v;
      }
      const dl = solveDense(A, rhs, m);
      if (!dl) return null;
      const Fdl = mulF(F, dl, m);
      for (let t = 0; t < m; t++) for (let k = from[t], a = t * n; k < n; k++) y[k] -= W[a + k] * Fdl[t];
      K.backward(y);
      const du = new Float64Array(n);
      for (let i = 0; i < n; i++) du[i] = y[K.place(i)];
      return { du, dl };
    },
  };
}
