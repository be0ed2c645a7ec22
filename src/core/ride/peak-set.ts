// The largest value of each of several quantities recorded together at
// points in time order (the ride's start, then points inside and at the end
// of every step). A local maximum
// among three points is refined by the parabola through them: the peak of a
// smooth hump between samples spaced Δ apart is then found to O(Δ³) instead of
// O(Δ²), so a peak that falls between the ends of a long step is not cut off.
// The parabola is used only where it is concave and its vertex lies between
// the outer points. The values of a point are written into `value` and the
// point added by its time alone: the ride's record is read at thousands of
// points a run, and passing each value to a call of its own costs a boxed
// number a value where the call is not inlined.

export class PeakSet {
  /** Each quantity's value at the point about to be added. */
  readonly value: Float64Array;
  /** Each quantity's largest value so far (−Infinity before any point). */
  readonly max: Float64Array;
  readonly #g0: Float64Array;
  readonly #g1: Float64Array;
  #t0 = NaN;
  #t1 = NaN;

  constructor(count: number) {
    this.value = new Float64Array(count);
    this.max = new Float64Array(count).fill(-Infinity);
    this.#g0 = new Float64Array(count).fill(NaN);
    this.#g1 = new Float64Array(count).fill(NaN);
  }

  /** The point at time t with the values in `value`. */
  add(t: number): void {
    const t0 = this.#t0, t1 = this.#t1;
    if (t <= t1 + 1e-12) return; // a point met twice (a sample on a step end)
    const { value, max } = this;
    const G0 = this.#g0, G1 = this.#g1;
    for (let k = 0; k < value.length; k++) {
      const g = value[k], g0 = G0[k], g1 = G1[k];
      if (g > max[k]) max[k] = g;
      if (g1 >= g0 && g1 >= g) {
        // Divided differences of the parabola through (t0, g0), (t1, g1), (t, g).
        const d01 = (g1 - g0) / (t1 - t0), d12 = (g - g1) / (t - t1);
        const a = (d12 - d01) / (t - t0);
        if (a < 0) {
          const tv = 0.5 * (t0 + t1) - d01 / (2 * a);
          if (tv > t0 && tv < t) {
            const v = g0 + d01 * (tv - t0) + a * (tv - t0) * (tv - t1);
            if (v > max[k]) max[k] = v;
          }
        }
      }
      G0[k] = g1;
      G1[k] = g;
    }
    this.#t0 = t1;
    this.#t1 = t;
  }
}
