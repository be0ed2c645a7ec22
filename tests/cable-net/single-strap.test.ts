import { describe, expect, it } from 'vitest';
import { buildNet, restLength } from '../../src/core/model/cable-net/net.ts';
import { solveNet } from '../../src/core/model/cable-net/solve-net.ts';
import { tensions } from '../../src/core/model/cable-net/floor-results.ts';

// Mechanics note, section 5, closed-form check: one strap of span L with a
// point load P at midspan, angle theta at the ends:
//   2 T sin(theta) = P,   T = (T_0 + EA) / cos(theta) - EA
// (the second from l_0 = (L/2) / (1 + T_0/EA) and T = EA (l - l_0) / l_0 with
// l = (L/2) / cos(theta)). Solved here for theta by Newton's method.

function closedForm(L: number, EA: number, T0: number, P: number): { theta: number; T: number; sag: number } {
  const f = (t: number) => 2 * Math.sin(t) * ((T0 + EA) / Math.cos(t) - EA) - P;
  const df = (t: number) => 2 * Math.cos(t) * ((T0 + EA) / Math.cos(t) - EA) + 2 * Math.sin(t) * ((T0 + EA) * Math.sin(t)) / Math.cos(t) ** 2;
  let theta = 0.3;
  for (let i = 0; i < 100; i++) theta -= f(theta) / df(theta);
  expect(Math.abs(f(theta))).toBeLessThan(1e-9 * P);
  return { theta, T: (T0 + EA) / Math.cos(theta) - EA, sag: (L / 2) * Math.tan(theta) };
}

function strap(L: number, EA: number, T0: number, refine: number) {
  return buildNet([{ family: 'front-to-back', number: 1, of: 1, cross: 0, start: 0, end: L, rails: ['rear', 'front'], stations: [{ s: L / 2 }], EA, pretension: T0, refine }]);
}

const settings = { tolerance_N: 1e-9, maxIterations: 60 };

describe('cable net: one strap with a point load at midspan', () => {
  // Demo-like numbers: 24 x 4 mm rawhide at 300 MPa, span 1 m.
  const L = 1000;
  const EA = 300 * 24 * 4;
  for (const [T0, P] of [[160, 500], [160, 20], [0, 500], [2000, 3000]] as const) {
    for (const refine of [1, 4]) {
      it(`T_0 = ${T0} N, P = ${P} N, ${2 * refine} segments: tension and sag within 0.1 % of the closed form`, () => {
        const net = strap(L, EA, T0, refine);
        const mid = net.straps[0].points[refine].node;
        const loads = new Float64Array(net.nodes.length);
        loads[mid] = P;
        const sol = solveNet(net, loads, settings);
        expect(sol.converged).toBe(true);
        const exact = closedForm(L, EA, T0, P);
        const T = tensions(net, sol.sag);
        for (const t of T) expect(Math.abs(t / exact.T - 1)).toBeLessThan(1e-3);
        expect(Math.abs(sol.sag[mid] / exact.sag - 1)).toBeLessThan(1e-3);
        // The unloaded nodes lie on the straight line from the end to the load.
        net.straps[0].points.forEach((p) => {
          if (p.node >= 0) expect(sol.sag[p.node]).toBeCloseTo((exact.sag * Math.min(p.s, L - p.s)) / (L / 2), 6);
        });
      });
    }
  }

  it('unstretched length: a segment stretched back to its flat length carries the pretension', () => {
    const l0 = restLength(34, 160, 28800);
    expect((28800 * (34 - l0)) / l0).toBeCloseTo(160, 9);
  });

  it('reports non-convergence instead of hiding it', () => {
    const net = strap(L, EA, 160, 1);
    const loads = new Float64Array(net.nodes.length).fill(500);
    const sol = solveNet(net, loads, { tolerance_N: 1e-9, maxIterations: 1 });
    expect(sol.converged).toBe(false);
    expect(sol.iterations).toBe(1);
    expect(sol.residual_N).toBeGreaterThan(1e-9);
    expect(sol.stopped).toMatch(/no convergence in 1 iterations/);
  });
});
