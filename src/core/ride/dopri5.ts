// The embedded Runge-Kutta pair of Dormand and Prince (dormand-prince-1980):
// seven stages, the fifth-order solution carried on, the fourth-order one
// only for the error estimate, the last stage at the new point reused as the
// first of the next step (FSAL), and the continuous extension of order four
// of Hairer, Nørsett and Wanner (hairer-norsett-wanner-1993, section II.6,
// their DOPRI5 code) for values anywhere inside an accepted step. Every
// array is allocated once, here: a step allocates nothing.

export type Rhs = (t: number, y: Float64Array, dy: Float64Array) => void;

const C2 = 1 / 5, C3 = 3 / 10, C4 = 4 / 5, C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const A71 = 35 / 384, A73 = 500 / 1113, A74 = 125 / 192, A75 = -2187 / 6784, A76 = 11 / 84;
// Fifth-order weights minus fourth-order weights: the local error estimate.
const E1 = 71 / 57600, E3 = -71 / 16695, E4 = 71 / 1920, E5 = -17253 / 339200, E6 = 22 / 525, E7 = -1 / 40;
// The continuous extension's fourth coefficient row.
const D1 = -12715105075 / 11282082432, D3 = 87487479700 / 32700410799, D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632, D6 = -1453857185 / 822651844, D7 = 69997945 / 29380423;

export class Dopri5 {
  readonly n: number;
  /** The derivative at the current point (stage 1; after an accepted step, stage 7 of it). */
  readonly k1: Float64Array;
  // Stages 2 to 7 and the dense output's coefficients as fields, not arrays of arrays: read in the inner loops without destructuring.
  readonly #k2: Float64Array;
  readonly #k3: Float64Array;
  readonly #k4: Float64Array;
  readonly #k5: Float64Array;
  readonly #k6: Float64Array;
  readonly #k7: Float64Array;
  /** The trial step's new point. */
  readonly y1: Float64Array;
  readonly #tmp: Float64Array;
  readonly #r1: Float64Array;
  readonly #r2: Float64Array;
  readonly #r3: Float64Array;
  readonly #r4: Float64Array;
  readonly #r5: Float64Array;
  #t0 = 0;
  #h = 0;

  constructor(readonly f: Rhs, n: number) {
    this.n = n;
    this.k1 = new Float64Array(n);
    const v = () => new Float64Array(n);
    [this.#k2, this.#k3, this.#k4, this.#k5, this.#k6, this.#k7] = [v(), v(), v(), v(), v(), v()];
    this.y1 = v();
    this.#tmp = v();
    [this.#r1, this.#r2, this.#r3, this.#r4, this.#r5] = [v(), v(), v(), v(), v()];
  }

  /**
   * A trial step of h from (t, y) with k1 = f(t, y) already in place: the new
   * point into y1, its derivative into stage 7, and the error norm scaled by
   * atol + rtol·max(|y|, |y1|) (root mean square; at most 1 to accept).
   */
  step(t: number, y: Float64Array, h: number, rtol: number, atol: number): number {
    const { n, f, k1, y1 } = this;
    const k2 = this.#k2, k3 = this.#k3, k4 = this.#k4, k5 = this.#k5, k6 = this.#k6, k7 = this.#k7;
    const w = this.#tmp;
    for (let i = 0; i < n; i++) w[i] = y[i] + h * A21 * k1[i];
    f(t + C2 * h, w, k2);
    for (let i = 0; i < n; i++) w[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
    f(t + C3 * h, w, k3);
    for (let i = 0; i < n; i++) w[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    f(t + C4 * h, w, k4);
    for (let i = 0; i < n; i++) w[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    f(t + C5 * h, w, k5);
    for (let i = 0; i < n; i++) w[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    f(t + h, w, k6);
    for (let i = 0; i < n; i++) y1[i] = y[i] + h * (A71 * k1[i] + A73 * k3[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
    f(t + h, y1, k7);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const e = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
      const sc = atol + rtol * Math.max(Math.abs(y[i]), Math.abs(y1[i]));
      sum += (e / sc) * (e / sc);
    }
    return Math.sqrt(sum / n);
  }

  /** After a trial step from (t, y) that passed the error test: the dense output over it. */
  dense(t: number, y: Float64Array, h: number): void {
    const { n, k1, y1 } = this;
    const k3 = this.#k3, k4 = this.#k4, k5 = this.#k5, k6 = this.#k6, k7 = this.#k7;
    const r1 = this.#r1, r2 = this.#r2, r3 = this.#r3, r4 = this.#r4, r5 = this.#r5;
    for (let i = 0; i < n; i++) {
      const dy = y1[i] - y[i], b = h * k1[i] - dy;
      r1[i] = y[i];
      r2[i] = dy;
      r3[i] = b;
      r4[i] = dy - h * k7[i] - b;
      r5[i] = h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
    }
    this.#t0 = t;
    this.#h = h;
  }

  /** The step is taken: its last stage, f at the new point, is the next step's first. */
  carry(): void {
    this.k1.set(this.#k7);
  }

  /** Component i of the last accepted step's continuous extension at time t. */
  value(i: number, t: number): number {
    const s = (t - this.#t0) / this.#h, s1 = 1 - s;
    const r1 = this.#r1, r2 = this.#r2, r3 = this.#r3, r4 = this.#r4, r5 = this.#r5;
    return r1[i] + s * (r2[i] + s1 * (r3[i] + s * (r4[i] + s1 * r5[i])));
  }

  /** The whole state of the last accepted step's continuous extension at time t, into out. */
  at(t: number, out: Float64Array): void {
    const s = (t - this.#t0) / this.#h, s1 = 1 - s;
    const r1 = this.#r1, r2 = this.#r2, r3 = this.#r3, r4 = this.#r4, r5 = this.#r5;
    for (let i = 0; i < this.n; i++) out[i] = r1[i] + s * (r2[i] + s1 * (r3[i] + s * (r4[i] + s1 * r5[i])));
  }
}
