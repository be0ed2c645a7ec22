// GMRES: the generalised minimal residual method for a square system A x = b
// with A known only through its products (Saad & Schultz, SIAM J. Sci. Stat.
// Comput. 7 (1986) 856-869). Arnoldi's process with modified Gram-Schmidt
// builds an orthonormal basis of the Krylov space, Givens rotations keep the
// small least-squares problem triangular, and the residual's norm is known at
// every step without forming x. Preconditioned on the right (A M⁻¹ u = b,
// x = M⁻¹ u), so the residual it measures is the system's own. Without a
// restart: in exact arithmetic it ends within n steps.

export interface GmresSettings {
  /** Converged when ‖b − A x‖ ≤ this × ‖b‖. */
  relativeTolerance: number;
  /** Arnoldi steps allowed (at most n are used). */
  maxIterations: number;
}

export interface GmresResult {
  x: Float64Array;
  converged: boolean;
  iterations: number;
  /** ‖b − A x‖ / ‖b‖ at the end (0 for b = 0). */
  relativeResidual: number;
}

/** out = A·v (or M⁻¹·v); `out` arrives filled with zeros. */
export type LinearMap = (v: Float64Array, out: Float64Array) => void;

/** Solves A x = b from x = 0; `precondition` applies M⁻¹ (omitted: M = I). */
export function gmres(n: number, apply: LinearMap, b: ArrayLike<number>, settings: GmresSettings, precondition?: LinearMap): GmresResult {
  const x = new Float64Array(n);
  let beta = 0;
  for (let r = 0; r < n; r++) beta += b[r] * b[r];
  beta = Math.sqrt(beta);
  if (beta === 0) return { x, converged: true, iterations: 0, relativeResidual: 0 };
  const k = Math.max(0, Math.min(settings.maxIterations, n));
  // The Krylov basis V (k + 1 vectors) and its preconditioned images Z, a vector after another; H's columns, already
  // rotated to upper triangular (column j in row-major place j·(k + 1)); g the rotated right-hand side βe₁.
  const V = new Float64Array((k + 1) * n);
  const Z = new Float64Array(k * n);
  const H = new Float64Array(k * (k + 1));
  const cs = new Float64Array(k);
  const sn = new Float64Array(k);
  const g = new Float64Array(k + 1);
  const w = new Float64Array(n);
  for (let r = 0; r < n; r++) V[r] = b[r] / beta;
  g[0] = beta;
  let j = 0;
  let residual = beta;
  while (j < k && residual > settings.relativeTolerance * beta) {
    const v = V.subarray(j * n, (j + 1) * n);
    const z = Z.subarray(j * n, (j + 1) * n);
    if (precondition) precondition(v, z);
    else z.set(v);
    w.fill(0);
    apply(z, w);
    const h = H.subarray(j * (k + 1), (j + 1) * (k + 1));
    for (let i = 0; i <= j; i++) {
      const vi = i * n;
      let d = 0;
      for (let r = 0; r < n; r++) d += w[r] * V[vi + r];
      h[i] = d;
      for (let r = 0; r < n; r++) w[r] -= d * V[vi + r];
    }
    let norm = 0;
    for (let r = 0; r < n; r++) norm += w[r] * w[r];
    h[j + 1] = Math.sqrt(norm);
    for (let i = 0; i < j; i++) {
      const t = cs[i] * h[i] + sn[i] * h[i + 1];
      h[i + 1] = -sn[i] * h[i] + cs[i] * h[i + 1];
      h[i] = t;
    }
    const next = h[j + 1];
    const rho = Math.hypot(h[j], next);
    if (rho === 0) break;
    cs[j] = h[j] / rho;
    sn[j] = next / rho;
    h[j] = rho;
    h[j + 1] = 0;
    g[j + 1] = -sn[j] * g[j];
    g[j] = cs[j] * g[j];
    residual = Math.abs(g[j + 1]);
    j++;
    // A zero next vector: the Krylov space is invariant and the solution exact (the "happy" breakdown).
    if (next === 0) break;
    for (let r = 0, o = j * n; r < n; r++) V[o + r] = w[r] / next;
  }
  // The least-squares coefficients: R y = g, then x = Z y.
  const y = new Float64Array(j);
  for (let i = j - 1; i >= 0; i--) {
    let s = g[i];
    for (let c = i + 1; c < j; c++) s -= H[c * (k + 1) + i] * y[c];
    y[i] = s / H[i * (k + 1) + i];
  }
  for (let c = 0; c < j; c++) for (let r = 0, o = c * n; r < n; r++) x[r] += y[c] * Z[o + r];
  const relativeResidual = residual / beta;
  return { x, converged: relativeResidual <= settings.relativeTolerance, iterations: j, relativeResidual };
}
