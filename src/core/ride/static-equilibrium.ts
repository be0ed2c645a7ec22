import { derivative, newForces, stateSize, type Forces, type RideSystem } from './ride-system.ts';

// The static equilibrium the ride starts from: every contact closed and
// linear, velocities zero, so the generalised forces are affine in the
// displacements; their Jacobian (found column by column, exact for an affine
// map up to rounding) is solved once by Gaussian elimination.

export interface StaticState {
  /** Full state (displacements then zero rates). */
  y: Float64Array;
  forces: Forces;
}

/** Generalised forces (mass times acceleration) at displacements q, rates zero. */
function generalised(s: RideSystem, q: ArrayLike<number>): number[] {
  const N = 3 + s.crew.length;
  const y = new Float64Array(stateSize(s));
  for (let i = 0; i < N; i++) y[i] = q[i];
  const dy = new Float64Array(stateSize(s));
  derivative(s, 0, y, dy, undefined, true);
  const masses = [s.body.mass_kg, s.body.Ipitch, s.body.Iroll, ...s.crew.map((c) => c.m)];
  return masses.map((m, i) => m * dy[N + i]);
}

export function solveLinear(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, i) => [...row, b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    if (M[p][c] === 0) throw new Error('the ride model has no static equilibrium: a degree of freedom is not held by any spring');
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= n; k++) M[r][k] -= f * M[c][k];
    }
  }
  return M.map((row, i) => row[n] / row[i]);
}

export function staticEquilibrium(s: RideSystem): StaticState {
  const N = 3 + s.crew.length;
  const zero = new Array<number>(N).fill(0);
  const f0 = generalised(s, zero);
  const J: number[][] = Array.from({ length: N }, () => new Array<number>(N).fill(0));
  for (let j = 0; j < N; j++) {
    const e = [...zero];
    e[j] = 1e-3;
    const fj = generalised(s, e);
    for (let i = 0; i < N; i++) J[i][j] = (fj[i] - f0[i]) / 1e-3;
  }
  const q = solveLinear(J, f0.map((v) => -v));
  const y = new Float64Array(stateSize(s));
  q.forEach((v, i) => (y[i] = v));
  const forces = newForces(s);
  derivative(s, 0, y, new Float64Array(stateSize(s)), forces, true);
  // Each ground point at its static compression, F/k_g.
  let node = 2 * N;
  s.wheels.forEach((w, i) => (w.cGround > 0 ? (y[node++] = forces.wheel[i] / w.kGround) : 0));
  return { y, forces };
}
