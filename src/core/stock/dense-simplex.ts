// A revised primal simplex on a dense explicit basis inverse, for the small
// pattern LPs of a chariot's cut list (a handful of rows): it costs
// microseconds where building and solving a model in the WebAssembly solver
// costs milliseconds and tens of MB. The caller supplies columns whose unit
// vectors form the starting basis, so the start is feasible (b >= 0). Bland's
// rule (lowest index enters, lowest index leaves on a tie) keeps it from
// cycling on degenerate vertices (Bland, Mathematics of Operations Research 2
// (1977)); the inverse is rebuilt from the basis columns before optimality is
// declared, so drift from the updates never reaches the value.
import { squareTimesVector } from '../numeric/square-times-vector.ts';

/** Reduced costs and pivots below this are taken as zero. */
const TOL = 1e-9;

export interface DenseColumn {
  cost: number;
  /** The column's entries, one per row. */
  a: Float64Array;
}

export class DenseSimplex {
  readonly columns: DenseColumn[] = [];
  /** Pivots made so far: the work the caller counts. */
  pivots = 0;
  private readonly m: number;
  private readonly basis: Int32Array;
  private readonly inv: Float64Array;
  private readonly beta: Float64Array;

  /** `start[r]` is the index (into `columns`) of a column equal to unit vector r. */
  constructor(
    private readonly b: Float64Array,
    columns: DenseColumn[],
    start: number[],
  ) {
    this.m = b.length;
    this.columns.push(...columns);
    this.basis = Int32Array.from(start);
    this.inv = new Float64Array(this.m * this.m);
    this.beta = new Float64Array(this.m);
    this.refactor();
  }

  add(c: DenseColumn): void {
    this.columns.push(c);
  }

  /** Simplex multipliers y = c_B B^-1 (one per row). */
  duals(): Float64Array {
    const { m, inv, basis, columns } = this;
    const y = new Float64Array(m);
    for (let i = 0; i < m; i++) {
      const c = columns[basis[i]].cost;
      if (c !== 0) for (let r = 0; r < m; r++) y[r] += c * inv[i * m + r];
    }
    return y;
  }

  value(): number {
    let v = 0;
    for (let i = 0; i < this.m; i++) v += this.columns[this.basis[i]].cost * this.beta[i];
    return v;
  }

  /** Column values at the current basis. */
  values(): Float64Array {
    const x = new Float64Array(this.columns.length);
    for (let i = 0; i < this.m; i++) x[this.basis[i]] = this.beta[i];
    return x;
  }

  /**
   * Pivot to an optimum within `maxPivots` in all; false when the pivots ran
   * out or the LP is unbounded below.
   */
  solve(maxPivots: number): boolean {
    let fresh = true;
    for (;;) {
      const q = this.entering();
      if (q < 0) {
        if (fresh) return true;
        this.refactor();
        fresh = true;
        continue;
      }
      if (this.pivots >= maxPivots) return false;
      const u = this.ftran(this.columns[q].a);
      const r = this.leaving(u);
      if (r < 0) return false;
      this.pivot(r, q, u);
      this.pivots++;
      fresh = false;
    }
  }

  private entering(): number {
    const y = this.duals();
    const inBasis = new Set(this.basis);
    for (let j = 0; j < this.columns.length; j++) {
      if (inBasis.has(j)) continue;
      const { cost, a } = this.columns[j];
      let d = cost;
      for (let r = 0; r < this.m; r++) d -= y[r] * a[r];
      if (d < -TOL * Math.max(1, Math.abs(cost))) return j;
    }
    return -1;
  }

  private leaving(u: Float64Array): number {
    let best = -1;
    let ratio = Infinity;
    for (let i = 0; i < this.m; i++) {
      if (u[i] <= TOL) continue;
      const t = this.beta[i] / u[i];
      if (t < ratio - 1e-12 || (t <= ratio + 1e-12 && this.basis[i] < this.basis[best])) {
        ratio = Math.min(ratio, t);
        best = i;
      }
    }
    return best;
  }

  /** B^-1 a. */
  private ftran(a: Float64Array): Float64Array {
    return squareTimesVector(this.inv, a, this.m);
  }

  private pivot(r: number, q: number, u: Float64Array): void {
    const { m, inv, beta } = this;
    const ur = u[r];
    for (let c = 0; c < m; c++) inv[r * m + c] /= ur;
    beta[r] /= ur;
    for (let i = 0; i < m; i++) {
      if (i === r || u[i] === 0) continue;
      const f = u[i];
      for (let c = 0; c < m; c++) inv[i * m + c] -= f * inv[r * m + c];
      beta[i] -= f * beta[r];
    }
    this.basis[r] = q;
  }

  /** Rebuild B^-1 from the basis columns by Gauss-Jordan with partial pivoting, then beta = B^-1 b. */
  private refactor(): void {
    const { m, inv, basis, columns } = this;
    const w = 2 * m;
    const t = new Float64Array(m * w);
    for (let i = 0; i < m; i++) {
      for (let r = 0; r < m; r++) t[r * w + i] = columns[basis[i]].a[r];
      t[i * w + m + i] = 1;
    }
    for (let c = 0; c < m; c++) {
      let p = c;
      for (let r = c + 1; r < m; r++) if (Math.abs(t[r * w + c]) > Math.abs(t[p * w + c])) p = r;
      if (p !== c) for (let k = 0; k < w; k++) [t[c * w + k], t[p * w + k]] = [t[p * w + k], t[c * w + k]];
      const d = t[c * w + c];
      for (let k = 0; k < w; k++) t[c * w + k] /= d;
      for (let r = 0; r < m; r++) {
        const f = t[r * w + c];
        if (r === c || f === 0) continue;
        for (let k = 0; k < w; k++) t[r * w + k] -= f * t[c * w + k];
      }
    }
    for (let i = 0; i < m; i++) for (let r = 0; r < m; r++) inv[i * m + r] = t[i * w + m + r];
    this.beta.set(this.ftran(this.b));
  }
}
