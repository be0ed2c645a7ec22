// A symmetric positive-definite matrix in skyline (variable-band) storage and
// its Cholesky factor L L^T, computed in place. Only the entries inside each
// row's envelope are stored; the factor fills no entry outside it. Callers use
// their own numbering; `order[i]` gives row i's place in the stored matrix,
// chosen to keep the envelope small.

export class SkylineCholesky {
  readonly n: number;
  readonly #order: Int32Array;
  /** First stored column of each stored row. */
  readonly #first: Int32Array;
  /** Offset of each stored row's first entry in #a. */
  readonly #start: Int32Array;
  #a: Float64Array;
  #factored = false;

  /** `pairs`: every (i, j) that may be non-zero, in the caller's numbering. */
  constructor(n: number, pairs: Iterable<readonly [number, number]>, order?: Int32Array) {
    this.n = n;
    this.#order = order ?? Int32Array.from({ length: n }, (_, i) => i);
    const first = Int32Array.from({ length: n }, (_, i) => i);
    for (const [i, j] of pairs) {
      const I = this.#order[i];
      const J = this.#order[j];
      if (I > J) first[I] = Math.min(first[I], J);
      else if (J > I) first[J] = Math.min(first[J], I);
    }
    this.#first = first;
    this.#start = new Int32Array(n + 1);
    for (let r = 0; r < n; r++) this.#start[r + 1] = this.#start[r] + (r - first[r] + 1);
    this.#a = new Float64Array(this.#start[n]);
  }

  /** Stored entries: the envelope's size. */
  get size(): number {
    return this.#a.length;
  }

  zero(): void {
    this.#a.fill(0);
    this.#factored = false;
  }

  /** Add v to entry (i, j) and, for i != j, to (j, i) (one symmetric entry). */
  add(i: number, j: number, v: number): void {
    const p = this.#order[i];
    const q = this.#order[j];
    const I = p > q ? p : q;
    const J = p > q ? q : p;
    const first = this.#first[I];
    if (J < first) throw new Error(`entry (${i}, ${j}) is outside the declared pattern`);
    this.#a[this.#start[I] + J - first] += v;
  }

  /** Factor in place; false (and the matrix spoilt) when it is not positive definite. */
  factor(): boolean {
    const a = this.#a;
    const first = this.#first;
    const start = this.#start;
    for (let i = 0; i < this.n; i++) {
      const fi = first[i];
      const ri = start[i] - fi;
      for (let j = fi; j <= i; j++) {
        const rj = start[j] - first[j];
        let s = a[ri + j];
        for (let k = Math.max(fi, first[j]); k < j; k++) s -= a[ri + k] * a[rj + k];
        if (j < i) a[ri + j] = s / a[rj + j];
        else {
          if (!(s > 0)) return false;
          a[ri + i] = Math.sqrt(s);
        }
      }
    }
    this.#factored = true;
    return true;
  }

  /** Row i's place in the stored matrix (the caller's numbering to the stored one). */
  place(i: number): number {
    return this.#order[i];
  }

  /** Every row's place (`place` for all at once, for loops over the whole matrix). */
  get order(): Int32Array {
    return this.#order;
  }

  /** Solve A x = b with the factor; b in the caller's numbering. */
  solve(b: ArrayLike<number>): Float64Array {
    const order = this.#order;
    const y = new Float64Array(this.n);
    for (let i = 0; i < this.n; i++) y[order[i]] = b[i];
    this.forward(y);
    this.backward(y);
    const x = new Float64Array(this.n);
    for (let i = 0; i < this.n; i++) x[i] = y[order[i]];
    return x;
  }

  /**
   * L y = b in place, b in the stored numbering. Rows before `from` must hold
   * zeros (they stay zero): a right-hand side that starts late costs less.
   */
  forward(y: Float64Array, from = 0): void {
    if (!this.#factored) throw new Error('factor the matrix before solving');
    const a = this.#a;
    const first = this.#first;
    const start = this.#start;
    for (let i = from; i < this.n; i++) {
      const ri = start[i] - first[i];
      let s = y[i];
      for (let k = Math.max(first[i], from); k < i; k++) s -= a[ri + k] * y[k];
      y[i] = s / a[ri + i];
    }
  }

  /** Lᵀ x = y in place, in the stored numbering. */
  backward(y: Float64Array): void {
    if (!this.#factored) throw new Error('factor the matrix before solving');
    const a = this.#a;
    const first = this.#first;
    const start = this.#start;
    for (let i = this.n - 1; i >= 0; i--) {
      const ri = start[i] - first[i];
      y[i] /= a[ri + i];
      const yi = y[i];
      for (let k = first[i]; k < i; k++) y[k] -= a[ri + k] * yi;
    }
  }
}
