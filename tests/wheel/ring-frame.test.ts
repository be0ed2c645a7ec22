import { describe, expect, it } from 'vitest';
import { solveRingFrame, type RingSpring } from '../../src/core/model/wheel/ring-frame.ts';
import { nodeAt, ringNodes } from '../../src/core/model/wheel/ring-mesh.ts';

// The ring of straight beam elements against the closed form of a thin
// circular ring under n equal radial loads, equally spaced (Roark's Formulas
// for Stress and Strain, thin closed rings, the case of equal radial loads:
// rules/sources.yaml `roark-thin-ring`; bending energy only):
//   M under a load = (P R / 2)(1/α − cot α),  M midway = (P R / 2)(1/sin α − 1/α),  α = π/n,
// n = 2 giving P R / π (Roark's diametral case). Inward loads flatten the ring
// under them: the model's sign puts the inner face in tension there (+), and
// midway the outer face (−).

const R = 400;
const P = 1000;
const EI = 1e10;
// A thin ring: the hoop strain negligible next to bending (E·A·R² = 10⁴ E·I).
const EA = (1e4 * EI) / R ** 2;

const underLoad = (n: number) => ((P * R) / 2) * (n / Math.PI - 1 / Math.tan(Math.PI / n));
const midway = (n: number) => ((P * R) / 2) * (1 / Math.sin(Math.PI / n) - n / Math.PI);

/** Three token springs hold the free ring; the loads are in balance, so they take nothing. */
function holds(nodes: readonly number[]): RingSpring[] {
  return [
    { node: 0, direction: 'radial', k: 1 },
    { node: 0, direction: 'tangential', k: 1 },
    { node: nodeAt(nodes, Math.PI), direction: 'tangential', k: 1 },
  ];
}

function nLoads(n: number, perSpan: number) {
  const at = Array.from({ length: n }, (_, k) => (2 * Math.PI * k) / n);
  const nodes = ringNodes([...at, Math.PI / n, Math.PI], (2 * Math.PI) / n / perSpan);
  const springs = holds(nodes);
  const sol = solveRingFrame({ radius: R, nodes, EA, EI, springs, loads: at.map((a) => ({ node: nodeAt(nodes, a), radial: -P, tangential: 0 })) });
  return { nodes, sol, springs };
}

describe('ring frame against the thin-ring closed form (roark-thin-ring)', () => {
  it('the closed form itself: n = 2 gives P R / π, as Roark gives for two loads on a diameter', () => {
    expect(underLoad(2)).toBeCloseTo((P * R) / Math.PI, 9);
    // Check values of the research notes (P = R = 1): n = 6 gives 0.08890 and 0.04507.
    expect(underLoad(6) / (P * R)).toBeCloseTo(0.0889, 4);
    expect(midway(6) / (P * R)).toBeCloseTo(0.04507, 5);
  });

  for (const n of [2, 3, 4, 6, 9, 12]) {
    it(`n = ${n}: the moment under a load and midway within 0.2 % at 32 elements a span, and the holds take nothing`, () => {
      const { nodes, sol } = nLoads(n, 32);
      expect(sol.moment[0] / underLoad(n)).toBeCloseTo(1, 2);
      expect(Math.abs(sol.moment[0] / underLoad(n) - 1)).toBeLessThan(2e-3);
      expect(Math.abs(sol.moment[nodeAt(nodes, Math.PI / n)] / -midway(n) - 1)).toBeLessThan(2e-3);
      // The spring forces (k = 1 N/mm times the stretch) are nil against P.
      for (const s of sol.springStretch) expect(Math.abs(s)).toBeLessThan(1e-6 * P);
    });
  }

  it('converges as the square of the element length (straight chords of a curve)', () => {
    const err = [8, 16, 32].map((m) => Math.abs(nLoads(6, m).sol.moment[0] / underLoad(6) - 1));
    expect(err[0] / err[1]).toBeGreaterThan(3.5);
    expect(err[0] / err[1]).toBeLessThan(4.5);
    expect(err[1] / err[2]).toBeGreaterThan(3.5);
    expect(err[1] / err[2]).toBeLessThan(4.5);
  });

  it('an even pressure alone gives hoop force p·R and no moment (thin ring under pressure)', () => {
    const nodes = ringNodes([0, Math.PI], Math.PI / 96);
    const p = 2; // N/mm
    const sol = solveRingFrame({ radius: R, nodes, EA, EI, springs: holds(nodes), loads: [], pressure: p });
    // Straight chords: the polygon's hoop force is p·R·cos(Δθ/2), within 1e-4 of p·R here.
    for (const e of sol.elements) expect(e.N / (-p * R)).toBeCloseTo(1, 3);
    for (const m of sol.moment) expect(Math.abs(m)).toBeLessThan(1e-6 * p * R * R);
  });

  it('a hinge carries no moment', () => {
    const at = [0, Math.PI];
    const nodes = ringNodes([...at, Math.PI / 2, (3 * Math.PI) / 2], Math.PI / 32);
    const hinge = nodeAt(nodes, Math.PI / 2);
    const springs: RingSpring[] = [...holds(nodes), { node: hinge, direction: 'radial', k: 1e3 }, { node: nodeAt(nodes, (3 * Math.PI) / 2), direction: 'radial', k: 1e3 }];
    const sol = solveRingFrame({ radius: R, nodes, EA, EI, springs, hinges: [hinge], loads: at.map((a) => ({ node: nodeAt(nodes, a), radial: -P, tangential: 0 })) });
    expect(Math.abs(sol.moment[hinge])).toBeLessThan(1e-6 * P * R);
    expect(Math.abs(sol.moment[0])).toBeGreaterThan(0.1 * P * R);
  });
});
