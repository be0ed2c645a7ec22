import { describe, expect, it } from 'vitest';
import { cantileverEndLoadMoment, centreLoadMoment, eulerLoad, pointLoadsMaxMoment, uniformLoadMoment } from '../src/core/model/beam-formulas.ts';
import { rectangle, round } from '../src/core/model/sections.ts';

// Each closed form is checked against an independent numerical solution, and the
// standard cases named beside them.

/** Bending moment along a beam from its loads, by summing moments of the forces to one side. */
function momentAt(x: number, forces: { at: number; F: number }[]): number {
  return forces.filter((p) => p.at < x).reduce((m, p) => m + p.F * (x - p.at), 0);
}

describe('beam moments', () => {
  it('cantilever with an end load: M = W l at the support', () => {
    // Roark's Formulas for Stress and Strain, 7th ed., Table 8.1, case 1a (left end free, right
    // end fixed, load at the free end; case number from memory).
    const W = 1200;
    const l = 2.3;
    expect(Math.abs(momentAt(l, [{ at: 0, F: -W }]))).toBeCloseTo(cantileverEndLoadMoment(W, l), 9);
  });

  it('simply supported span, load at midspan: M = W l / 4', () => {
    // Roark, 7th ed., Table 8.1, case 1e (both ends simply supported), a = l/2 (case number from memory).
    const W = 3000;
    const l = 0.9;
    const forces = [{ at: 0, F: W / 2 }, { at: l / 2, F: -W }, { at: l, F: W / 2 }];
    let max = 0;
    for (let i = 0; i <= 1000; i++) max = Math.max(max, momentAt((i / 1000) * l + 1e-12, forces));
    expect(max).toBeCloseTo(centreLoadMoment(W, l), 6);
  });

  it('simply supported span, uniform load: M = w l² / 8', () => {
    // Roark, 7th ed., Table 8.1, case 2e with the load over the whole span (case number from memory).
    const w = 4.7;
    const l = 1020;
    const n = 4000;
    const forces = [{ at: 0, F: (w * l) / 2 }, ...Array.from({ length: n }, (_, i) => ({ at: ((i + 0.5) * l) / n, F: -(w * l) / n })), { at: l, F: (w * l) / 2 }];
    expect(momentAt(l / 2, forces) / uniformLoadMoment(w, l)).toBeCloseTo(1, 6);
  });
});

describe('simply supported span under point loads', () => {
  /** Largest moment of the span by sampling momentAt finely, supports as forces (R_A = Σ P_i (l − a_i)/l). */
  function sampledMax(l: number, loads: { at: number; P: number }[]): { M: number; at: number } {
    const RA = loads.reduce((s, q) => s + (q.P * (l - q.at)) / l, 0);
    const forces = [{ at: 0, F: RA }, ...loads.map((q) => ({ at: q.at, F: -q.P }))];
    let best = { M: 0, at: 0 };
    // The loads' own positions are sampled too: the moment is linear between loads.
    for (const x of [...Array.from({ length: 2001 }, (_, i) => (i / 2000) * l), ...loads.map((q) => q.at)]) {
      const M = momentAt(x, forces);
      if (M > best.M) best = { M, at: x };
    }
    return best;
  }

  it('one load P at a: M = P·a·(l − a)/l, under the load', () => {
    // Roark's Formulas for Stress and Strain, 7th ed., Table 8.1, case 1e (both ends simply
    // supported, concentrated intermediate load): M_max = W a (l − a)/l at the load (case number from memory).
    const P = 900;
    const l = 1020;
    const a = 300;
    const r = pointLoadsMaxMoment(l, [{ at: a, P }]);
    expect(r.M).toBeCloseTo((P * a * (l - a)) / l, 9);
    expect(r.at).toBe(a);
    // At midspan it is the centre-load case W l/4.
    expect(pointLoadsMaxMoment(l, [{ at: l / 2, P }]).M).toBeCloseTo(centreLoadMoment(P, l), 9);
  });

  it('two equal loads P at a from each support: M = P·a, constant between them', () => {
    // Gere & Timoshenko, Mechanics of Materials, table of simple-beam deflections and moments,
    // two symmetric concentrated loads (from memory); also Roark case 1e superposed.
    const P = 450;
    const l = 560;
    const a = 120;
    const r = pointLoadsMaxMoment(l, [{ at: l - a, P }, { at: a, P }]);
    expect(r.M).toBeCloseTo(P * a, 9);
    // Both loads carry the same moment; the first one reached from support A is reported.
    expect(r.at).toBe(a);
  });

  it('n equal loads at spacing l/n: the uniform-load moment w·l²/8, w = nP/l, exactly for even n and × (1 + 1/n²) for odd n', () => {
    // Roark, Table 8.1, case 2e, uniform load over the whole span: w l²/8 at midspan (from memory).
    // Loads at a_i = (i − ½)·l/n. Even n = 2m: M(l/2) = (nP/2)(l/2) − P·(l/n)·Σ_{j=1..m}(j − ½)
    // = nPl/4 − P·l·m²/(2n) = nPl/8. Odd n = 2m + 1 (a load at midspan):
    // M(l/2) = nPl/4 − P·(l/n)·m(m + 1)/2 = nPl/4 − Pl(n² − 1)/(8n) = (nPl/8)(1 + 1/n²).
    const l = 1020;
    const P = 60;
    const at = (n: number) => Array.from({ length: n }, (_, i) => ({ at: ((i + 0.5) * l) / n, P }));
    for (const n of [2, 4, 30, 300]) expect(pointLoadsMaxMoment(l, at(n)).M / uniformLoadMoment((n * P) / l, l)).toBeCloseTo(1, 9);
    for (const n of [1, 3, 31, 301]) {
      const r = pointLoadsMaxMoment(l, at(n));
      expect(r.M / uniformLoadMoment((n * P) / l, l)).toBeCloseTo(1 + 1 / n ** 2, 9);
      expect(r.at).toBeCloseTo(l / 2, 9);
    }
  });

  it('unequal loads in any order match the moment found by sampling the span', () => {
    const l = 1020;
    const loads = [{ at: 700, P: 310 }, { at: 40, P: 120 }, { at: 505, P: 416.9 }, { at: 260, P: 80 }, { at: 980, P: 55 }];
    const r = pointLoadsMaxMoment(l, loads);
    const s = sampledMax(l, loads);
    expect(r.M).toBeCloseTo(s.M, 6);
    expect(r.at).toBe(s.at);
  });

  it('loads at or beyond a support go straight to it and bend nothing', () => {
    const l = 800;
    const inside = [{ at: 300, P: 200 }];
    const withEnds = [...inside, { at: 0, P: 5000 }, { at: l, P: 5000 }, { at: -10, P: 5000 }, { at: l + 10, P: 5000 }];
    expect(pointLoadsMaxMoment(l, withEnds)).toEqual(pointLoadsMaxMoment(l, inside));
    expect(pointLoadsMaxMoment(l, [])).toEqual({ M: 0, at: 0 });
  });
});

describe('Euler column', () => {
  // Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., section 2.1 (from memory):
  // P_cr = π² E I / (K L)², K = 1 pinned-pinned, K = 2 fixed-free.
  // Checked against the smallest eigenvalue of E I w'' + P w = 0 by finite differences.
  function numericalLoad(E: number, I: number, L: number, fixedFree: boolean): number {
    const n = 2000;
    const h = fixedFree ? (2 * L) / n : L / n; // a fixed-free strut buckles as half of a pinned one of twice its length
    const m = n - 1;
    // Inverse iteration on the tridiagonal matrix (2, −1)/h², solved by the Thomas algorithm.
    let v = new Float64Array(m).fill(1);
    let lambda = 0;
    for (let it = 0; it < 60; it++) {
      const c = new Float64Array(m);
      const d = new Float64Array(m);
      c[0] = -0.5;
      d[0] = (v[0] * h * h) / 2;
      for (let i = 1; i < m; i++) {
        const den = 2 + c[i - 1];
        c[i] = -1 / den;
        d[i] = (v[i] * h * h + d[i - 1]) / den;
      }
      const x = new Float64Array(m);
      x[m - 1] = d[m - 1];
      for (let i = m - 2; i >= 0; i--) x[i] = d[i] - c[i] * x[i + 1];
      const norm = Math.sqrt(x.reduce((s, y) => s + y * y, 0));
      lambda = Math.sqrt(v.reduce((s, y) => s + y * y, 0)) / norm;
      v = x.map((y) => y / norm);
    }
    return lambda * E * I;
  }

  it('matches the numerical eigenvalue for pinned ends (K = 1) and a fixed-free strut (K = 2)', () => {
    const E = 7657;
    const I = 60 ** 4 / 12;
    const L = 2390;
    expect(numericalLoad(E, I, L, false) / eulerLoad(E, I, L, 1)).toBeCloseTo(1, 5);
    expect(numericalLoad(E, I, L, true) / eulerLoad(E, I, L, 2)).toBeCloseTo(1, 5);
  });
});

describe('sections', () => {
  /** Second moment of area by summing strips of width b(y). */
  function I(width: (y: number) => number, h: number): number {
    const n = 20000;
    let s = 0;
    for (let i = 0; i < n; i++) {
      const y = -h / 2 + ((i + 0.5) * h) / n;
      s += width(y) * y * y * (h / n);
    }
    return s;
  }

  it('rectangle: I = b h³/12, W = b h²/6, by strips', () => {
    const r = rectangle(78, 72);
    expect(I(() => 78, 72) / r.I).toBeCloseTo(1, 6);
    expect(r.W).toBeCloseTo(r.I / 36, 9);
    // Buckling takes the weaker axis: for 40 × 60 bent about the 60 mm depth, I_min is about the 40 mm side.
    const s = rectangle(40, 60);
    expect(s.I / I(() => 40, 60)).toBeCloseTo(1, 6);
    expect(s.Imin / I(() => 60, 40)).toBeCloseTo(1, 6);
  });

  it('round: I = π d⁴/64, W = π d³/32, by strips', () => {
    const d = 76;
    const c = round(d);
    expect(I((y) => 2 * Math.sqrt(Math.max(0, (d / 2) ** 2 - y * y)), d) / c.I).toBeCloseTo(1, 5);
    expect(c.W).toBeCloseTo(c.I / (d / 2), 9);
  });
});
