/** y = A·x for a row-major m × m matrix A. */
export function squareTimesVector(A: ArrayLike<number>, x: ArrayLike<number>, m: number): Float64Array {
  const y = new Float64Array(m);
  for (let s = 0; s < m; s++) {
    let v = 0;
    for (let t = 0; t < m; t++) v += A[s * m + t] * x[t];
    y[s] = v;
  }
  return y;
}
