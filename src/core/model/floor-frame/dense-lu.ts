// A small dense square system A x = b by Gaussian elimination with partial
// pivoting (row-major storage). For the few dozen to few hundred strap
// unknowns of the floor-frame coupling; the large sparse systems use the
// skyline Cholesky factor.

/** Solves A x = b for a row-major n × n matrix; A and b are left unchanged. Null where A is singular. */
export function solveDense(A: ArrayLike<number>, b: ArrayLike<number>, n: number): Float64Array | null {
  const a = Float64Array.from(A);
  const x = Float64Array.from(b);
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(a[i]));
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]) > Math.abs(a[p * n + k])) p = i;
    if (!(Math.abs(a[p * n + k]) > 1e-14 * scale)) return null;
    if (p !== k) {
      for (let j = 0; j < n; j++) [a[k * n + j], a[p * n + j]] = [a[p * n + j], a[k * n + j]];
      [x[k], x[p]] = [x[p], x[k]];
    }
    const pivot = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const m = a[i * n + k] / pivot;
      if (m === 0) continue;
      for (let j = k; j < n; j++) a[i * n + j] -= m * a[k * n + j];
      x[i] -= m * x[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let s = x[k];
    for (let j = k + 1; j < n; j++) s -= a[k * n + j] * x[j];
    x[k] = s / a[k * n + k];
  }
  return x;
}
