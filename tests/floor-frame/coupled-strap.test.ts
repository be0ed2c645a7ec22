import { describe, expect, it } from 'vitest';
import { buildNet, type StrapLine } from '../../src/core/model/cable-net/net.ts';
import { solveCoupled } from '../../src/core/model/cable-net/coupled-solve.ts';
import { solveNet } from '../../src/core/model/cable-net/solve-net.ts';
import { tensions } from '../../src/core/model/cable-net/floor-results.ts';

// The coupled net against a hand model: straps with a point load where they
// cross, each strap anchored on two flexible rails, each rail a simply
// supported beam of span L_r loaded at midspan by the strap's pull H, so
// each anchor moves in by H·L_r³/(48·E·I) (Roark's Formulas for Stress and
// Strain, Table 8.1, case 1e: centre load on a simply supported beam) and
// the strap shortens by twice that. The hand solution is compatibility of
// the strap's stretch and the rails' deflection: with half plan length
// a = (L − e)/2 and sag w, the strap (cut to L_0 = L/(1 + T_0/EA)) has
// length 2·√(a² + w²), tension T = EA·(l − L_0)/L_0, pull H = T·a/√(a² + w²),
// and e = F·H with F = 2·L_r³/(48·E·I); vertical balance at the load:
// Σ 2·T·w/√(a² + w²) = P. Solved here by bisection, nested: for each w the
// shortening e of each strap (H falls as e grows, so e − F·H(e) rises), then
// w from the vertical balance.

const EA = 300 * 30 * 10; // rawhide 30 × 10 mm at 300 MPa (demo data)
const T0 = 60;

interface HandStrap {
  L: number;
  F: number;
}

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(lo) * f(mid) <= 0) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}

function strapAt(s: HandStrap, w: number, e: number) {
  const L0 = s.L / (1 + T0 / EA);
  const a = (s.L - e) / 2;
  const half = Math.hypot(a, w);
  const T = Math.max(0, (EA * (2 * half - L0)) / L0);
  return { T, H: (T * a) / half, V: (2 * T * w) / half };
}

/** The hand solution: the sag at the crossing, and each strap's shortening and tension. */
function hand(straps: HandStrap[], P: number) {
  const at = (w: number) =>
    straps.map((s) => {
      const e = bisect((x) => x - s.F * strapAt(s, w, x).H, 0, s.L / 10);
      return { e, ...strapAt(s, w, e) };
    });
  const w = bisect((x) => at(x).reduce((sum, q) => sum + q.V, 0) - P, 0, 500);
  return { w, straps: at(w) };
}

const line = (family: StrapLine['family'], L: number): StrapLine => ({
  family,
  number: 1,
  of: 1,
  cross: family === 'front-to-back' ? 0 : L / 2,
  start: family === 'front-to-back' ? 0 : -L / 2,
  end: family === 'front-to-back' ? L : L / 2,
  rails: family === 'front-to-back' ? ['rear', 'front'] : ['right', 'left'],
  stations: [{ s: family === 'front-to-back' ? L / 2 : 0, key: 'centre' }],
  EA,
  pretension: T0,
  refine: 1,
});

/** Rails as simply supported beams of span Lr, E·I: each strap shortens by 2·H·Lr³/(48·E·I). */
const railFlexibility = (Lr: number, EI: number) => (2 * Lr ** 3) / (48 * EI);
// A white-ash rail 45 × 80 mm bent in plan: E·I = 12 000 MPa × 45 × 80³/12 (demo data).
const EI = (12000 * 45 * 80 ** 3) / 12;
const settings = { tolerance_N: 1e-9, maxIterations: 100 };

describe('coupled net: straps on flexible rails against the hand model', () => {
  it('one strap (1020 mm) on two simply supported 1100 mm rails, 800 N at midspan', () => {
    const L = 1020;
    const F = railFlexibility(1100, EI);
    const net = buildNet([line('front-to-back', L)]);
    const loads = new Float64Array(net.nodes.length).fill(800);
    const sol = solveCoupled(net, loads, [F], settings);
    expect(sol.converged).toBe(true);
    const h = hand([{ L, F }], 800);
    // Agreement to 1e-6 relative: both solve the same equations, one by Newton, one by bisection.
    expect(sol.sag[0] / h.w - 1).toBeCloseTo(0, 6);
    expect(sol.shortening[0] / h.straps[0].e - 1).toBeCloseTo(0, 6);
    expect(sol.pulls[0] / h.straps[0].H - 1).toBeCloseTo(0, 6);
    const T = tensions({ ...net, segments: net.segments.map((s, i) => ({ ...s, flat: sol.flats[i] })) }, sol.sag);
    for (const t of T) expect(t / h.straps[0].T - 1).toBeCloseTo(0, 6);
    // The rails bow: the strap sags deeper than on rigid anchors.
    const rigid = hand([{ L, F: 0 }], 800);
    expect(h.w).toBeGreaterThan(rigid.w);
  });

  it('two crossing straps (1020 and 560 mm), each on its own pair of rails, 1500 N at the crossing', () => {
    const straps = [
      { L: 1020, F: railFlexibility(640, EI) },
      { L: 560, F: railFlexibility(1100, EI) },
    ];
    const net = buildNet([line('front-to-back', straps[0].L), line('side-to-side', straps[1].L)]);
    expect(net.nodes).toHaveLength(1);
    const sol = solveCoupled(net, [1500], [straps[0].F, 0, 0, straps[1].F], settings);
    expect(sol.converged).toBe(true);
    const h = hand(straps, 1500);
    expect(sol.sag[0] / h.w - 1).toBeCloseTo(0, 6);
    h.straps.forEach((q, s) => {
      expect(sol.shortening[s] / q.e - 1).toBeCloseTo(0, 6);
      expect(sol.pulls[s] / q.H - 1).toBeCloseTo(0, 6);
    });
    // The short strap on the long, soft rails loses more of its pull than on rigid anchors.
    const rigid = hand(straps.map((s) => ({ ...s, F: 0 })), 1500);
    expect(h.straps[1].H).toBeLessThan(rigid.straps[1].H);
    expect(h.w).toBeGreaterThan(rigid.w);
  });

  it('pretension alone: each strap keeps T_0/(1 + F·(EA + T_0)/L), the imposed strain shared with the rails', () => {
    // No load: the strap stays flat, T = EA·((L − e)/L_0 − 1) = T_0 − (EA + T_0)·e/L and e = F·T.
    const L = 1020;
    const F = railFlexibility(1100, EI);
    const net = buildNet([line('front-to-back', L)]);
    const sol = solveCoupled(net, [0], [F], settings);
    expect(sol.pulls[0]).toBeCloseTo(T0 / (1 + (F * (EA + T0)) / L), 9);
    expect(sol.sag[0]).toBe(0);
  });

  it('stiff rails: the coupled solution tends to the net on fixed anchors', () => {
    const L = 1020;
    const net = buildNet([line('front-to-back', L), line('side-to-side', 560)]);
    const fixed = solveNet(net, [1500], settings);
    const gaps = [1e-2, 1e-4, 1e-6].map((scale) => {
      const sol = solveCoupled(net, [1500], [scale * railFlexibility(640, EI), 0, 0, scale * railFlexibility(1100, EI)], settings);
      return Math.abs(sol.sag[0] / fixed.sag[0] - 1);
    });
    // The gap falls with the rails' flexibility, about in proportion to it.
    expect(gaps[1]).toBeLessThan(gaps[0] / 50);
    expect(gaps[2]).toBeLessThan(1e-6);
  });
});
