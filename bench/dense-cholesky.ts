// The in-run reference for the floor bench: a plain dense Cholesky factor and
// solve (row-major, no pivoting, n³/6 multiply-adds) of the same symmetric
// positive-definite matrix the skyline factor takes, at the same size.

/** Factor A = L·Lᵀ in place (lower triangle); false where A is not positive definite. */
export function denseCholesky(a: Float64Array, n: number): boolean {
  for (let j = 0; j < n; j++) {
    let d = a[j * n + j];
    for (let k = 0; k < j; k++) d -= a[j * n + k] * a[j * n + k];
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    a[j * n + j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = a[i * n + j];
      for (let k = 0; k < j; k++) s -= a[i * n + k] * a[j * n + k];
      a[i * n + j] = s / ljj;
    }
  }
  return true;
}

/** Solve L·Lᵀ x = b with the factor; b is overwritten by x. */
export function denseCholeskySolve(l: Float64Array, n: number, b: Float64Array): void {
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[i * n + k] * b[k];
    b[i] = s / l[i * n + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let k = i + 1; k < n; k++) s -= l[k * n + i] * b[k];
    b[i] = s / l[i * n + i];
  }
}
