// A symmetric positive-definite matrix kept as a band of fixed half-width
// (the lower triangle only), factored in place as L·Lᵀ. A ring numbered from
// both ends inwards has every element within a few places of the diagonal, so
// the band is narrow and even: a fixed width wastes next to nothing and the
// matrix copies as one block, which lets a ring's element part be assembled
// once and copied for each set of springs.

export class BandCholesky {
  readonly n: number;
  /** Places each side of the diagonal that may hold entries. */
  readonly width: number;
  /** `order[i]`: the place of the caller's row i in the band. */
  readonly #order: Int32Array;
  /** Row-major, `width + 1` entries a row: columns i − width … i. */
  readonly #a: Float64Array;
  #factored = false;

  constructor(n: number, width: number, order: Int32Array, a?: Float64Array) {
    this.n = n;
    this.width = width;
    this.#order = order;
    this.#a = a ?? new Float64Array(n * (width + 1));
  }

  /** An unfactored copy (the same numbering, its own entries). */
  copy(): BandCholesky {
    if (this.#factored) throw new Error('a factored band is not copied');
    return new BandCholesky(this.n, this.width, this.#order, this.#a.slice());
  }

  /** Add v to entry (i, j) and its mirror, in the caller's numbering. */
  add(i: number, j: number, v: number): void {
    const I = this.#order[i];
    const J = this.#order[j];
    const r = Math.max(I, J);
    const c = Math.min(I, J);
    if (r - c > this.width) throw new Error(`entry (${i}, ${j}) lies outside the band`);
    this.#a[r * (this.width + 1) + c - r + this.width] += v;
  }

  /**
   * Factor in place, column by column (each column scaled, then taken off the
   * columns to its right within the band); false where a pivot is not
   * positive: the matrix is not positive definite.
   */
  factor(): boolean {
    const a = this.#a;
    const w = this.width;
    const row = w + 1;
    for (let k = 0; k < this.n; k++) {
      const kk = k * row + w;
      const pivot = a[kk];
      if (!(pivot > 0)) return false;
      const d = Math.sqrt(pivot);
      a[kk] = d;
      const last = Math.min(this.n - 1, k + w);
      for (let i = k + 1; i <= last; i++) a[i * row + k - i + w] /= d;
      for (let i = k + 1; i <= last; i++) {
        const lik = a[i * row + k - i + w];
        if (lik === 0) continue;
        const ri = i * row - i + w;
        for (let j = k + 1; j <= i; j++) a[ri + j] -= lik * a[j * row + k - j + w];
      }
    }
    this.#factored = true;
    return true;
  }

  /** Solve A·x = b with the factor; b and x in the caller's numbering. */
  solve(b: ArrayLike<number>): Float64Array {
    if (!this.#factored) throw new Error('factor the band before solving');
    const a = this.#a;
    const w = this.width;
    const row = w + 1;
    const n = this.n;
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) y[this.#order[i]] = b[i];
    for (let i = 0; i < n; i++) {
      const ri = i * row - i + w;
      let s = y[i];
      for (let k = Math.max(0, i - w); k < i; k++) s -= a[ri + k] * y[k];
      y[i] = s / a[ri + i];
    }
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * row - i + w;
      const yi = (y[i] /= a[ri + i]);
      for (let k = Math.max(0, i - w); k < i; k++) y[k] -= a[ri + k] * yi;
    }
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) x[i] = y[this.#order[i]];
    return x;
  }
}
