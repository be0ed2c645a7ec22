// The largest value of a quantity recorded at points in time order (step
// ends, dense samples, events). A local maximum among three points is refined
// by the parabola through them: the peak of a smooth hump between samples
// spaced Δ apart is then found to O(Δ³) instead of O(Δ²), so a peak that
// falls between the ends of a long step is not cut off. The parabola is used
// only where it is concave and its vertex lies between the outer points.

export class PeakTracker {
  max = -Infinity;
  private t0 = NaN;
  private g0 = NaN;
  private t1 = NaN;
  private g1 = NaN;

  add(t: number, g: number): void {
    const t0 = this.t0, g0 = this.g0, t1 = this.t1, g1 = this.g1;
    if (t <= t1 + 1e-12) return; // a point met twice (a sample on a step end)
    if (g > this.max) this.max = g;
    if (g1 >= g0 && g1 >= g) {
      // Divided differences of the parabola through (t0, g0), (t1, g1), (t, g).
      const d01 = (g1 - g0) / (t1 - t0), d12 = (g - g1) / (t - t1);
      const a = (d12 - d01) / (t - t0);
      if (a < 0) {
        const tv = 0.5 * (t0 + t1) - d01 / (2 * a);
        if (tv > t0 && tv < t) {
          const v = g0 + d01 * (tv - t0) + a * (tv - t0) * (tv - t1);
          if (v > this.max) this.max = v;
        }
      }
    }
    this.t0 = t1;
    this.g0 = g1;
    this.t1 = t;
    this.g1 = g;
  }
}
