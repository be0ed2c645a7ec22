import { describe, expect, it } from 'vitest';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { floorNet } from '../../src/core/model/cable-net/floor-net.ts';
import { crewLoads, floorModel, nodalLoads } from '../../src/core/model/cable-net/floor-model.ts';
import { FloorOutline } from '../../src/core/model/cable-net/outline.ts';
import { pointWeights, weightedSum } from '../../src/core/model/cable-net/point-sag.ts';
import { G } from '../../src/core/units/units.ts';
import { deepMerge, prepared, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const STANDING = { value: 1, source: 'test' };
const DEMOS = ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed'];
const WEAVES = ['two-way', 'front-to-back', 'side-to-side'] as const;

/** The rules data with the floor solver's tolerance replaced. */
function withTolerance(fraction: number): RulesData {
  return withParams('floor.solver', { tolerance_fraction: fraction });
}

const specOf = (demo: string, straps: Record<string, unknown> = {}) => prepared(deepMerge(readDemo(demo), { floor_straps: straps }));

describe('floor cable net', () => {
  for (const demo of DEMOS) {
    for (const weave of WEAVES) {
      it(`${demo}, ${weave}: converges standing and at a bump, and the frame reactions sum to the load`, () => {
        // Tight tolerance so the equilibrium check is not hidden by the solve's own residual.
        const data = withTolerance(1e-11);
        for (const factor of [1, 2]) {
          const m = floorModel(specOf(demo, { weave }), data, { value: factor, source: 'test' });
          expect(m.converged, m.stopped).toBe(true);
          expect(m.residual_N).toBeLessThanOrEqual(m.tolerance_N);
          const crewWeight = prepared(readDemo(demo)).crew.reduce((s, c) => s + c.mass_kg * G * factor, 0);
          expect(m.appliedLoad_N).toBeCloseTo(crewWeight, 9);
          expect(Math.abs(m.reactionSum_N - m.appliedLoad_N)).toBeLessThan(1e-8 * m.appliedLoad_N);
        }
      });
    }
  }

  it('spreads each person over the nodes under the foot patch, all the load and no more', () => {
    for (const demo of DEMOS) {
      const spec = specOf(demo);
      const floor = floorNet(spec, rulesData);
      const crew = crewLoads(spec, floor, 1);
      for (const c of crew) {
        expect(c.weights.reduce((s, w) => s + w.w, 0)).toBeCloseTo(1, 12);
        for (const { node } of c.weights) {
          const q = floor.net.nodes[node];
          // Within the patch, or at most one pitch beyond it (a first node takes its end interval).
          expect(Math.abs(q.x - c.patch.x)).toBeLessThanOrEqual(c.patch.length / 2 + spec.floor_straps.pitch_mm);
          expect(Math.abs(q.y - c.patch.y)).toBeLessThanOrEqual(c.patch.width / 2 + spec.floor_straps.pitch_mm);
        }
      }
      const P = nodalLoads(floor, crew);
      expect(P.reduce((s, v) => s + v, 0)).toBeCloseTo(crew.reduce((s, c) => s + c.load_N, 0), 9);
    }
  });

  // Mesh independence: each strap interval split into 2 and 4 segments (the
  // one-way nets' node spacing, the two-way nets' nodes between crossings).
  // Stated tolerance: sag under each person within 2 % of the finest net at
  // the default mesh and 1 % at twice it. The
  // largest segment tension settles more slowly with the frame coupled (it
  // sits beside a segment the bowing rails leave slack, and nodes that move
  // only vertically let neighbouring segments differ): within 7 % at the
  // default mesh and 2 % at twice it.
  for (const demo of DEMOS) {
    for (const weave of WEAVES) {
      it(`${demo}, ${weave}: sag and largest tension independent of the mesh (2 %/1 % and 7 %/2 %)`, () => {
        const spec = specOf(demo, { weave });
        const [coarse, mid, fine] = [1, 2, 4].map((r) => floorModel(spec, rulesData, { value: 2, source: 'test' }, { refine: r }));
        expect(Math.abs(coarse.maxTension_N / fine.maxTension_N - 1)).toBeLessThan(0.07);
        expect(Math.abs(mid.maxTension_N / fine.maxTension_N - 1)).toBeLessThan(0.02);
        coarse.crew.forEach((c, i) => expect(Math.abs(c.sag_mm / fine.crew[i].sag_mm - 1)).toBeLessThan(0.02));
        mid.crew.forEach((c, i) => expect(Math.abs(c.sag_mm / fine.crew[i].sag_mm - 1)).toBeLessThan(0.01));
        expect(fine.nodes).toBeGreaterThan(2 * coarse.nodes);
      });
    }
  }

  it('tangent stiffness agrees with a re-solve under a small extra load, and exceeds the secant (the net stiffens)', () => {
    const data = withTolerance(1e-12);
    for (const demo of DEMOS) {
      const raw = readDemo(demo) as { crew: { mass_kg: unknown }[] };
      const spec = prepared(raw);
      const base = floorModel(spec, data, STANDING);
      const eps = 1e-4;
      const bumped = prepared(deepMerge(raw, { crew: spec.crew.map((c, i) => (i === 0 ? { ...c, mass_kg: c.mass_kg * (1 + eps) } : c)) }));
      const more = floorModel(bumped, data, STANDING);
      const c0 = base.crew[0];
      const fd = (more.crew[0].load_N - c0.load_N) / (more.crew[0].sag_mm - c0.sag_mm);
      expect(Math.abs(c0.tangentStiffness_N_per_mm / fd - 1)).toBeLessThan(1e-3);
      expect(c0.secantStiffness_N_per_mm).toBeCloseTo(c0.load_N / c0.sag_mm, 12);
      for (const c of base.crew) expect(c.tangentStiffness_N_per_mm).toBeGreaterThan(c.secantStiffness_N_per_mm);
    }
  });

  it('pulls each rail in the plane with at least the pretension of every strap ending on it', () => {
    for (const demo of DEMOS) {
      for (const weave of WEAVES) {
        const spec = specOf(demo, { weave });
        const floor = floorNet(spec, rulesData);
        const m = floorModel(spec, rulesData, STANDING);
        const T0 = spec.floor_straps.pretension_N;
        for (const r of m.rails) {
          const ends = floor.net.straps.reduce((n, s) => n + s.rails.filter((x) => x === r.rail).length, 0);
          // H = EA (flat/l_0 - flat/l) >= EA (flat/l_0 - 1) = T_0, since l >= flat.
          expect(r.total_N).toBeGreaterThanOrEqual(ends * T0 * (1 - 1e-12));
          if (ends === 0) expect(r.total_N).toBe(0);
          expect(r.lineLoad_N_per_mm * spec.floor_straps.pitch_mm * ends).toBeGreaterThanOrEqual(r.total_N * (1 - 1e-12));
        }
      }
    }
  });

  it('reads the sag at a point from the nodes: exact at a node, linear between, zero at the frame', () => {
    const spec = specOf('demo-two-crew');
    const floor = floorNet(spec, rulesData);
    const sag = Float64Array.from(floor.net.nodes, (q) => 1 + 0.01 * q.x + 0.002 * q.y); // a plane: bilinear reads it exactly
    const inner = floor.net.nodes.filter((q) => q.x > 100 && q.x < 400 && Math.abs(q.y) < 300);
    for (const q of inner.slice(0, 20)) {
      expect(weightedSum(pointWeights(floor.net, floor.outline, q.x, q.y), sag)).toBeCloseTo(1 + 0.01 * q.x + 0.002 * q.y, 9);
      expect(weightedSum(pointWeights(floor.net, floor.outline, q.x + 7, q.y - 11), sag)).toBeCloseTo(1 + 0.01 * (q.x + 7) + 0.002 * (q.y - 11), 9);
    }
    expect(weightedSum(pointWeights(floor.net, floor.outline, 0, 0), sag)).toBe(0);
    expect(weightedSum(pointWeights(floor.net, floor.outline, 200, spec.box.floor.width_mm / 2), sag)).toBe(0);
  });

  it('rounds the front corners of a bent front rail and drops the crossings outside them', () => {
    // Inner-face radius = centre-line radius - half the rail width: 180 - 21 = 159 mm (demo-two-crew).
    const o = new FloorOutline(560, 1020, 180, 42);
    expect(o.cornerRadius).toBe(159);
    expect(o.frontAt(0)).toBe(560);
    expect(o.frontAt(510)).toBeCloseTo(560 - 159, 9); // at the side rail the arc meets it a radius back
    expect(o.halfWidthAt(560)).toBeCloseTo(510 - 159, 9);
    expect(o.halfWidthAt(100)).toBe(510);
    // 45 degrees round the corner: both read the same point of the arc.
    const c = 159 * Math.SQRT1_2;
    expect(o.frontAt(510 - 159 + c)).toBeCloseTo(560 - 159 + c, 9);
    const floor = floorNet(specOf('demo-two-crew'), rulesData);
    // Four jointed corners (no bend radius): every crossing is inside.
    const squareRaw = readDemo('demo-two-crew') as { box: { floor: { frame: Record<string, unknown> } } };
    delete squareRaw.box.floor.frame.bend_radius_mm;
    const square = floorNet(prepared(squareRaw), rulesData);
    expect(square.net.nodes.length).toBe(floor.fbY.length * floor.ssX.length);
    expect(floor.net.nodes.length).toBeLessThan(square.net.nodes.length);
    for (const q of floor.net.nodes) expect(floor.outline.inside(q.x, q.y)).toBe(true);
  });

  it('declines a net too fine to solve in the time, and says so', () => {
    const m = floorModel(specOf('demo-two-crew', { width_mm: 5, thickness_mm: 1, pitch_mm: 5 }), rulesData, STANDING);
    expect(m.converged).toBe(false);
    expect(m.stopped).toMatch(/max_nodes/);
    expect(Number.isNaN(m.maxTension_N)).toBe(true);
  });
});
