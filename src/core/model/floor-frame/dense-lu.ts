// A small dense square system A x = b by Gaussian elimination with partial
// pivoting (row-major storage). For the few dozen to few hundred strap
// unknowns of the floor-frame coupling; the large sparse systems use the
// skyline Cholesky factor. Factor once, solve as often as needed.

/** The LU factor of a square matrix, for repeated solves. */
export interface DenseLU {
  readonly n: number;
  /** x with A x = b; b is left unchanged. */
  solve(b: ArrayLike<number>): Float64Array;
}

/** Factors a row-major n × n matrix (A is left unchanged); null where it is singular. */
export function factorDense(A: ArrayLike<number>, n: number): DenseLU | null {
  const a = Float64Array.from(A);
  // The row that ended up in each place (the pivoting's row swaps, applied to b when solving).
  const perm = Int32Array.from({ length: n }, (_, i) => i);
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(a[i]));
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]) > Math.abs(a[p * n + k])) p = i;
    if (!(Math.abs(a[p * n + k]) > 1e-14 * scale)) return null;
    if (p !== k) {
      for (let j = 0; j < n; j++) [a[k * n + j], a[p * n + j]] = [a[p * n + j], a[k * n + j]];
      [perm[k], perm[p]] = [perm[p], perm[k]];
    }
    const pivot = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const m = a[i * n + k] / pivot;
      // The multiplier is kept below the diagonal, where the eliminated entry was.
      a[i * n + k] = m;
      if (m === 0) continue;
      for (let j = k + 1; j < n; j++) a[i * n + j] -= m * a[k * n + j];
    }
  }
  return {
    n,
    solve(b) {
      const x = new Float64Array(n);
      for (let i = 0; i < n; i++) x[i] = b[perm[i]];
      for (let i = 1; i < n; i++) {
        let s = x[i];
        for (let k = 0; k < i; k++) s -= a[i * n + k] * x[k];
        x[i] = s;
      }
      for (let k = n - 1; k >= 0; k--) {
        let s = x[k];
        for (let j = k + 1; j < n; j++) s -= a[k * n + j] * x[j];
        x[k] = s / a[k * n + k];
      }
      return x;
    },
  };
}

/** Solves A x = b for a row-major n × n matrix; A and b are left unchanged. Null where A is singular. */
export function solveDense(A: ArrayLike<number>, b: ArrayLike<number>, n: number): Float64Array | null {
  return factorDense(A, n)?.solve(b) ?? null;
}
