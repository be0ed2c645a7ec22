import { describe, expect, it } from 'vitest';
import { PeakSet } from '../../src/core/ride/peak-set.ts';
import { PeakTracker } from '../../src/core/ride/peak-tracker.ts';

// The peaks of several quantities recorded at the same points, each refined
// by the parabola through a local maximum and its two neighbours. Against
// closed forms: a parabola's own vertex is found exactly (to rounding), and a
// sine's peak between samples Δ apart within O(Δ³) where the samples alone
// miss it by O(Δ²) (the error of quadratic interpolation, the Lagrange
// remainder: Burden & Faires, Numerical Analysis, section 3.1; the reference
// from memory). The curves and the sample spacings are test inputs of our own.

describe('the peak set', () => {
  it("finds a parabola's vertex between samples exactly, for every quantity at once", () => {
    const vertices = [0.0137, 0.05, 0.0871];
    const set = new PeakSet(vertices.length);
    for (let i = 0; i <= 20; i++) {
      const t = i * 0.005;
      vertices.forEach((tv, k) => (set.value[k] = 3 + k - 40 * (t - tv) ** 2));
      set.add(t);
    }
    vertices.forEach((_, k) => expect(Math.abs(set.max[k] - (3 + k))).toBeLessThan(1e-12));
  });

  it("finds a sine's peak between samples to the third order in their spacing", () => {
    for (const dt of [0.02, 0.01]) {
      const phases = [0.3, 1.1];
      const set = new PeakSet(phases.length);
      let plain = -Infinity;
      for (let t = 0; t <= 2; t += dt) {
        phases.forEach((p, k) => (set.value[k] = Math.sin(7 * t + p)));
        plain = Math.max(plain, set.value[0]);
        set.add(t);
      }
      const err = 1 - set.max[0];
      expect(err).toBeGreaterThanOrEqual(-1e-12);
      // (7Δ)³ bounds the refined error; the samples alone are off by up to (7Δ)²/8.
      expect(err).toBeLessThan((7 * dt) ** 3);
      expect(1 - set.max[1]).toBeLessThan((7 * dt) ** 3);
      expect(1 - plain).toBeGreaterThan(err);
    }
  });

  it('reads a point met twice once, and agrees with the one-quantity tracker', () => {
    const set = new PeakSet(1), one = new PeakTracker();
    const points: [number, number][] = [[0, 0], [0.1, 0.8], [0.1, 5], [0.2, 1], [0.3, 0.2]];
    for (const [t, g] of points) {
      set.value[0] = g;
      set.add(t);
      one.add(t, g);
    }
    // The second point at 0.1 s is not read: its 5 never becomes the peak.
    expect(set.max[0]).toBeLessThan(1.2);
    expect(set.max[0]).toBe(one.max);
  });
});
