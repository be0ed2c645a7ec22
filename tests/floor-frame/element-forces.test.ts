import { describe, expect, it } from 'vitest';
import { elementForces, elementStiffness } from '../../src/core/model/floor-frame/frame-element.ts';

// A plane frame element's end forces against the textbook's route (the
// standard 6 × 6 element, e.g. Przemieniecki, Theory of Matrix Structural
// Analysis, ch. 5): the local stiffness k times the end displacements turned
// into the element's axes, f = k·T·d, each sum in the matrix's order, bit for
// bit; and the end forces balance the global stiffness's nodal forces K·d.
// The geometries, sections and displacements are test inputs of our own.

function textbook(x1: number, y1: number, x2: number, y2: number, EA: number, EI: number, d: number[]): number[] {
  const dx = x2 - x1, dy = y2 - y1, L = Math.hypot(dx, dy), c = dx / L, s = dy / L;
  const a = EA / L, b = (12 * EI) / L ** 3, k = (6 * EI) / L ** 2, m = (4 * EI) / L, e = (2 * EI) / L;
  const K = [
    [a, 0, 0, -a, 0, 0],
    [0, b, k, 0, -b, k],
    [0, k, m, 0, -k, e],
    [-a, 0, 0, a, 0, 0],
    [0, -b, -k, 0, b, -k],
    [0, k, e, 0, -k, m],
  ];
  const dl = [c * d[0] + s * d[1], -s * d[0] + c * d[1], d[2], c * d[3] + s * d[4], -s * d[3] + c * d[4], d[5]];
  return K.map((row) => row.reduce((sum, v, j) => sum + v * dl[j], 0));
}

describe('the frame element end forces', () => {
  it('are the local stiffness times the local displacements, to the last bit, and balance K·d', () => {
    let seed = 7;
    const r = () => (seed = (Math.imul(seed, 48271) % 2147483647) >>> 0) / 2147483647 - 0.5;
    for (let i = 0; i < 200; i++) {
      const g = { x1: 1000 * r(), y1: 1000 * r(), x2: 1000 * r(), y2: 1000 * r() };
      const sec = { EA: 1e6 * (1 + r()), EI: 1e9 * (1 + r()) };
      const d = Array.from({ length: 6 }, () => r());
      const f = textbook(g.x1, g.y1, g.x2, g.y2, sec.EA, sec.EI, d);
      const got = elementForces(g, sec, d);
      expect([got.V, got.M1, got.N, got.M2]).toEqual([f[1], -f[2], f[3], f[5]]);
      // K·d in global axes: the axial and shear forces turned back, the moments as they are.
      const K = elementStiffness(g, sec);
      const Kd = K.map((row) => row.reduce((sum, v, j) => sum + v * d[j], 0));
      const scale = Math.max(...Kd.map(Math.abs));
      expect(Math.abs(Kd[2] - f[2]) / scale).toBeLessThan(1e-9);
      expect(Math.abs(Kd[5] - f[5]) / scale).toBeLessThan(1e-9);
    }
  });
});
