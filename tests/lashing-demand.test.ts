import { describe, expect, it } from 'vitest';
import { Analysis } from './support/analysis.ts';
import { cornerDemand } from '../src/core/model/corner-demand.ts';
import type { FloorResult } from '../src/core/model/floor-result.ts';
import { governing, jointForceWith } from '../src/core/model/joint-force.ts';

// EN 1990 Table A1.2(B): gamma_Q 1.5 on the leading variable action.
const force = jointForceWith(1.5);
import { loadFactor } from '../src/core/model/load-factors.ts';
import { G } from '../src/core/units/units.ts';
import { dataWithGround, handSpec, prepared } from './support/fixtures.ts';

// Hand calculations on the hand spec: measured masses box 20, axle 8, two
// wheels of 10, pole 9 (straight and level from x = 0 to the yoke at 2500 mm,
// centroid at 1250 mm), one crew member of 80 kg; axle at 250 mm; no rolling
// resistance on this ground.
const data = dataWithGround('hand-rigid', 0);
const kStop = loadFactor(data, 'stopping_shock_factor').value;
const demandsOf = (raw: unknown) => new Analysis(prepared(raw, data), data).lashingDemands;
const byId = <T extends { id: string }>(cases: T[], id: string) => cases.find((c) => c.id === id)!;
// v = 15 km/h = 4.1667 m/s on R_y = 12 m, L = 2.25 m: R_a = √(144 − 5.0625) = 11.787 m,
// a_lat = v² R_a / R_y² = 1.4211 m/s² (design basis, section 4).
const aLat = ((15 / 3.6) ** 2 * Math.sqrt(144 - 2.25 ** 2)) / 144;

describe('lashing demands', () => {
  const d = demandsOf(handSpec());
  // The bump factor is the ride model's crew floor factor (src/ride/dynamic-factors.ts).
  const bumpFactor = new Analysis(prepared(handSpec(), data), data).bumpFactors.crew;
  const kBump = bumpFactor.value;

  it('takes its bump factor from the ride model', () => {
    expect(bumpFactor.source).toMatch(/^ride model/);
    expect(kBump).toBeGreaterThan(1);
  });

  it('the pole crossings pass the whole rolling assembly’s draught and braking', () => {
    const m = 20 + 8 + 2 * 10 + 9 + 80; // 137 kg
    const axle = d['pole-to-axle'].cases;
    expect(byId(axle, 'draught').along_N).toBeCloseTo(m * 0.2 * G, 9);
    expect(byId(axle, 'braking').along_N).toBeCloseTo(m * 0.3 * G, 9);
    expect(byId(axle, 'stopping-shock').along_N).toBeCloseTo(m * 0.3 * G * kStop, 9);
    expect(byId(d['pole-to-yoke'].cases, 'stopping-shock').along_N).toBeCloseTo(m * 0.3 * G * kStop, 9);
    // Fundamental cases take 1.5 on the action, accidental ones 1.0 (EN 1990 eq. 6.10 and 6.11).
    expect([byId(axle, 'braking').combination, byId(axle, 'braking').gamma]).toEqual(['fundamental', 1.5]);
    expect([byId(axle, 'stopping-shock').combination, byId(axle, 'stopping-shock').gamma]).toEqual(['accidental', 1]);
    expect([byId(axle, 'stone').combination, byId(axle, 'stone').gamma]).toEqual(['accidental', 1]);
  });

  it('the rough-ground case multiplies the largest standing pole load', () => {
    // Moments about the axle, L = 2.25 m: pole 9 kg 1.0 m ahead; the crew at the
    // front of the usable floor (500 − 150 = 350 mm) is 0.1 m ahead: R = 17 g / 2.25.
    const R = (17 * G) / 2.25;
    expect(byId(d['pole-to-axle'].cases, 'rough-ground').normal_N).toBeCloseTo(kBump * R, 6);
    // At the yoke the yoke's own 4 kg counts too, R_yoke = R + 4 g.
    expect(byId(d['pole-to-yoke'].cases, 'rough-ground').normal_N).toBeCloseTo(kBump * (R + 4 * G), 6);
    // Its sense is not known: all of it is held by the lashing.
    expect(byId(d['pole-to-axle'].cases, 'rough-ground').held_N).toBeCloseTo(kBump * R, 6);
  });

  it('in the turn the pole carries the side pull m·a_lat·(x_g − x_a)/L', () => {
    // x_g = (20·250 + 8·250 + 20·250 + 9·1250 + 80·300)/137 = 344.89 mm
    const xg = (20 * 250 + 8 * 250 + 20 * 250 + 9 * 1250 + 80 * 300) / 137;
    expect(aLat).toBeCloseTo(1.4211, 4);
    expect(byId(d['pole-to-axle'].cases, 'turn').across_N).toBeCloseTo((137 * aLat * (xg - 250)) / 1000 / 2.25, 9);
  });

  it('the box joints carry the box and its crew: inertia in the face, the rough-ground rebound apart', () => {
    const m = 20 + 80; // the measured box and the crew
    for (const joint of ['pole-to-floor', 'axle-to-floor'] as const) {
      const c = d[joint].cases;
      expect(byId(c, 'draught').along_N).toBeCloseTo(m * 0.2 * G, 9);
      expect(byId(c, 'braking').shear_N).toBeCloseTo(m * 0.3 * G, 9);
      expect(byId(c, 'stopping-shock').shear_N).toBeCloseTo(m * 0.3 * G * kStop, 9);
      expect(byId(c, 'stopping-shock').apart_N).toBe(0); // the weight presses the seat
      expect(byId(c, 'rough-ground').normal_N).toBeCloseTo(kBump * m * G, 9);
      expect(byId(c, 'rough-ground').apart_N).toBeCloseTo((kBump - 1) * m * G, 9);
      expect(byId(c, 'turn').across_N).toBeCloseTo(m * aLat, 9);
    }
  });

  it('a chariot with no siding puts no load on a siding lashing; one with a siding does', () => {
    expect(d['siding-to-frame'].cases).toEqual([]);
    const s = handSpec();
    delete s.box.mass_kg;
    s.box.siding_mass_kg = 10;
    const shock = byId(demandsOf(s)['siding-to-frame'].cases, 'stopping-shock');
    expect(shock.shear_N).toBeCloseTo(10 * 0.3 * G * kStop, 9);
  });

  it('the governing case is the largest of the chosen measure', () => {
    const c = d['axle-to-floor'].cases;
    expect(governing(c, 'held_N')!.held_N).toBe(Math.max(...c.map((x) => x.held_N)));
    expect(governing([], 'held_N')).toBeUndefined();
  });
});

describe('frame corner demand', () => {
  const floor = (over: Partial<FloorResult> = {}): FloorResult => ({
    factor: 2, factorSource: 'test', converged: true, iterations: 3, residual_N: 0.01, tolerance_N: 0.1,
    maxTension_N: 0, maxTensionAt: '', maxStress_MPa: 0, crew: [], reactionSum_N: 0, appliedLoad_N: 0,
    rails: [
      { rail: 'front', span_mm: 500, lineLoad_N_per_mm: 0, total_N: 1000, pulls: [] },
      { rail: 'rear', span_mm: 500, lineLoad_N_per_mm: 0, total_N: 1000, pulls: [] },
      { rail: 'left', span_mm: 1000, lineLoad_N_per_mm: 0, total_N: 600, pulls: [] },
      { rail: 'right', span_mm: 1000, lineLoad_N_per_mm: 0, total_N: 600, pulls: [] },
    ],
    ...over,
  });

  it('each corner carries half of each rail that meets there', () => {
    const spec = prepared(handSpec(), data);
    const c = cornerDemand(spec, floor(), force);
    // √(500² + 300²) = 583.095 N at each of the four corners
    expect(c.cases.map((x) => x.id)).toEqual(['rear-left', 'rear-right', 'front-left', 'front-right']);
    for (const x of c.cases) expect(x.shear_N).toBeCloseTo(583.095, 3);
  });

  it('a front rail bent round the front corners leaves only the rear ones jointed', () => {
    const s = handSpec();
    s.box.floor.frame.bend_radius_mm = 100;
    expect(cornerDemand(prepared(s, data), floor(), force).cases.map((x) => x.id)).toEqual(['rear-left', 'rear-right']);
  });

  it('no converged floor, no corner demand: it says why', () => {
    const spec = prepared(handSpec(), data);
    expect(cornerDemand(spec, floor({ converged: false }), force).unknown).toMatch(/did not converge/);
    expect(cornerDemand(spec, undefined, force).unknown).toMatch(/no result/);
  });
});
