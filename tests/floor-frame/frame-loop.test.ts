import { describe, expect, it } from 'vitest';
import { FloorFrame, type FrameInput } from '../../src/core/model/floor-frame/frame-model.ts';

// The frame loop against closed forms. A rectangular frame with rigid corners,
// centre-line sides a (loaded) and b, pulled inwards by P at the middle of the
// two sides a: by symmetry a quarter frame with the redundant moment M_A at
// the load, zero rotation between the two planes of symmetry
// (∫M ds/EI = 0 over the quarter, the unit-load method; e.g. Roark's Formulas
// for Stress and Strain, chapter on rigid frames):
//   M_A = P·a·(a + 2b) / (8·(a + b)),   M_C = M_A − P·a/4 = −P·a² / (8·(a + b))
// (b → 0 gives the fixed-ended beam's P·a/8 both). The sides b carry P/2 in
// compression, the sides a nothing. The loads' approach by virtual work:
//   Δ = (4/EI)·[∫₀^{a/2} (m_A − x/2)² dx + m_C²·b/2] + b/(2·EA),  m = M/P.

const E = 12000;
const t = 45;
const w = 80;
const section = { EA: E * t * w, EI: (E * t * w ** 3) / 12 };

function rectangle(depth: number, width: number, innerRadius = 0, arcStepDeg = 2): FrameInput {
  return {
    shape: { depth, width, rail: w, innerRadius, arcStepDeg },
    section,
    // One side-to-side strap at mid-depth and one front-to-back strap on the centre line.
    anchors: [
      { side: 'right', at: depth / 2, dir: 'y', inward: 1 },
      { side: 'left', at: depth / 2, dir: 'y', inward: -1 },
      { side: 'rear', at: 0, dir: 'x', inward: 1 },
      { side: 'front', at: 0, dir: 'x', inward: -1 },
    ],
    straps: [
      [0, 1],
      [2, 3],
    ],
    struts: [],
  };
}

describe('floor frame loop', () => {
  const depth = 508;
  const width = 980;
  const a = depth + w; // the side rails' centre-line length, loaded
  const b = width + w;

  it('rigid square corners: moments and the loads\' approach as the closed form', () => {
    const frame = new FloorFrame(rectangle(depth, width));
    const P = 1000;
    const s = frame.solve([P, 0]);
    const MA = (P * a * (a + 2 * b)) / (8 * (a + b));
    const MC = (P * a * a) / (8 * (a + b));
    const side = s.rails.find((r) => r.rail === 'left')!;
    expect(side.M_Nmm).toBeCloseTo(MA, 6);
    expect(side.at).toEqual({ x: depth / 2, y: (width + w) / 2 });
    expect(side.N_N).toBeCloseTo(0, 9);
    const rear = s.rails.find((r) => r.rail === 'rear')!;
    expect(rear.M_Nmm).toBeCloseTo(MC, 6);
    expect(rear.N_N).toBeCloseTo(-P / 2, 9);
    const mA = MA / P;
    const mC = -MC / P;
    const integral = (mA * mA * a) / 2 - (mA * a * a) / 8 + a ** 3 / 96; // ∫₀^{a/2} (m_A − x/2)² dx
    const approach = (4 / section.EI) * (integral + (mC * mC * b) / 2) + b / (2 * section.EA);
    expect(s.shortening[0] / (P * approach) - 1).toBeCloseTo(0, 9);
    expect(frame.flexibility()[0] / approach - 1).toBeCloseTo(0, 9);
  });

  it('flexibility is symmetric (Maxwell-Betti) and the held points carry nothing', () => {
    for (const r of [0, 300]) {
      const frame = new FloorFrame(rectangle(depth, width, r));
      const F = frame.flexibility();
      expect(F[1] / F[2] - 1).toBeCloseTo(0, 9);
      expect(F[0]).toBeGreaterThan(0);
      expect(F[3]).toBeGreaterThan(0);
    }
  });

  it('bent front corners: the moments settle as the arcs are cut finer (within 0.5 % from 4° chords to 1°)', () => {
    const [coarse, mid, fine] = [4, 2, 1].map((deg) => new FloorFrame(rectangle(560, 1020, 440, deg)).solve([1000, 1000]));
    for (const m of [coarse, mid]) {
      m.rails.forEach((r, i) => expect(Math.abs(r.M_Nmm / fine.rails[i].M_Nmm - 1)).toBeLessThan(0.005));
      m.shortening.forEach((e, i) => expect(Math.abs(e / fine.shortening[i] - 1)).toBeLessThan(0.005));
    }
  });

  it('bent corners stiffen the loop: the same pull bows the rear rail less than with square corners, and a strut holds the side rails', () => {
    const square = new FloorFrame(rectangle(560, 1020)).solve([0, 1000]);
    const bent = new FloorFrame(rectangle(560, 1020, 440)).solve([0, 1000]);
    expect(bent.shortening[1]).toBeLessThan(square.shortening[1]);
    const input = rectangle(560, 1020);
    const strut = { part: 'axle' as const, ends: [{ side: 'right' as const, at: 280 }, { side: 'left' as const, at: 280 }] as [{ side: 'right'; at: number }, { side: 'left'; at: number }], dir: 'y' as const, stiffness_N_per_mm: 500 };
    const free = new FloorFrame(input).solve([1000, 0]);
    const held = new FloorFrame({ ...input, struts: [strut] }).solve([1000, 0]);
    // The strut and the frame share the pull in proportion to their stiffnesses: k_s·e' + e'/F = P.
    const F = free.shortening[0] / 1000;
    expect(held.shortening[0]).toBeCloseTo(1000 / (500 + 1 / F), 9);
    expect(held.struts[0].force_N).toBeCloseTo(500 * held.shortening[0], 6);
  });
});
