import { describe, expect, it } from 'vitest';
import { loadCases, staticPoleLoad } from '../src/core/model/load-cases.ts';
import { massModel } from '../src/core/model/mass-model.ts';
import { G } from '../src/core/units/units.ts';
import { dataWithGround, handSpec, prepared } from './support/fixtures.ts';

// Worked examples written out by hand for the hand-calculation spec
// (tests/support/fixtures.ts), using the moment balance of the mechanics
// note, section 3, with g = 9.80665 m/s^2 (mechanics note, section 0).
const rigid = dataWithGround('hand-rigid', 0);

describe('mass model, hand calculation', () => {
  const spec = prepared(handSpec(), rigid);
  const model = massModel(spec, rigid);
  const part = (name: string) => model.parts.find((p) => p.part === name)!;

  it('places each part where the geometry puts it', () => {
    expect(part('axle')).toMatchObject({ mass_kg: 8, x_mm: 250, z_mm: 450, measured: true }); // axle centre at the wheel radius, 900/2
    expect(part('wheel, left')).toMatchObject({ mass_kg: 10, y_mm: 800, z_mm: 450 }); // half the 1600 mm track
    expect(part('wheel, right').y_mm).toBe(-800);
    // Straight level pole from x = 0 to the yoke at 2500: centre at 1250, height 530.
    expect(part('pole').x_mm).toBeCloseTo(1250, 9);
    expect(part('pole').z_mm).toBeCloseTo(530, 9);
    expect(part('box')).toMatchObject({ mass_kg: 20, measured: true });
    expect(part('box').x_mm).toBeCloseTo(250, 9); // symmetric box: centre of the 500 mm floor
    expect(part('crew, driver').z_mm).toBe(1600); // 600 floor + 1000 default centre-of-mass height
    expect(part('yoke').group).toBe('yoke');
  });

  it('totals the rolling assembly and the whole', () => {
    // 20 box + 8 axle + 2 x 10 wheels + 9 pole + 80 crew = 137 kg; + 4 yoke = 141 kg.
    expect(model.rolling.mass_kg).toBeCloseTo(137, 9);
    expect(model.total.mass_kg).toBeCloseTo(141, 9);
    // x_g = (20*250 + 8*250 + 20*250 + 9*1250 + 80*300) / 137 = 47250/137 = 344.891 mm
    expect(model.rolling.x_mm).toBeCloseTo(47250 / 137, 9);
  });

  it('computes a timber part from volume and density when no mass is given', () => {
    const s = handSpec();
    delete s.axle.mass_kg;
    const m = massModel(prepared(s, rigid), rigid).parts.find((p) => p.part === 'axle')!;
    // rock elm: basic SG 0.57, SG 0.63 at 12 % (Wood Handbook Table 5-3a as transcribed);
    // density at 12 % = 1000 x 0.63 x 1.12 = 705.6 kg/m^3; volume 2.0 x 0.07 x 0.07 = 0.0098 m^3.
    expect(m.mass_kg).toBeCloseTo(0.0098 * 705.6, 6);
    expect(m.measured).toBe(false);
  });
});

describe('load on the horses, hand calculation', () => {
  const spec = prepared(handSpec(), rigid);
  const cases = loadCases(spec, rigid);
  const byId = (id: string) => cases.find((c) => c.id === id)!;
  const L = 2.5 - 0.25; // yoke x minus axle x, m
  const moment = (9 * (1.25 - 0.25) + 80 * (0.3 - 0.25)) * G; // box, axle, wheels sit at x_a: no moment

  it('static, crew as placed', () => {
    const R = moment / L; // 13 kg m x g / 2.25 m = 56.661 N
    expect(byId('static').pole_load_N).toBeCloseTo(R, 9);
    expect(R).toBeCloseTo(56.661, 3);
    expect(byId('static').yoke_load_N).toBeCloseTo(R + 4 * G, 9);
    expect(byId('static').per_horse_N).toBeCloseTo((R + 4 * G) / 2, 9);
    expect(byId('static').axle_load_N).toBeCloseTo(137 * G - R, 9);
  });

  it('accelerating and braking add m*a*(h_y - h_g)/L', () => {
    const model = massModel(spec, rigid);
    const hg = model.rolling.z_mm / 1000;
    const hy = 0.53;
    const acc = byId('accelerating').pole_load_N;
    const brk = byId('braking').pole_load_N;
    expect(acc).toBeCloseTo((moment + 137 * 0.2 * G * (hy - hg)) / L, 9);
    expect(brk).toBeCloseTo((moment - 137 * 0.3 * G * (hy - hg)) / L, 9);
    // The centre of mass stands above the yoke point, so braking loads the yoke.
    expect(hg).toBeGreaterThan(hy);
    expect(brk).toBeGreaterThan(acc);
  });

  it('the envelope puts the crew at the ends of the usable floor', () => {
    // usable margin 150 mm (default): crew at x = 350 (forward) and 150 (aft)
    expect(byId('crew-forward').pole_load_N).toBeCloseTo((9 * 1.0 + 80 * 0.1) * G / L, 9);
    expect(byId('crew-aft').pole_load_N).toBeCloseTo((9 * 1.0 - 80 * 0.1) * G / L, 9);
    expect(cases).toHaveLength(9);
  });

  it('rolling resistance in two parts, each with its own arm, checked against the statics of the wheel and the chariot', () => {
    // Soil 0.1 at the reference wheel of 1200 mm (rules/parameters/rolling.yaml), scaled to this 900 mm wheel
    // (Morin: inversely with the diameter); the hub's journal friction 0.08 (Bourne after Morin).
    const data = dataWithGround('hand-rigid', 0.1, 0.08);
    const R = staticPoleLoad(spec, data).pole_N;
    const N = 137 * G - R; // the weight left on the wheels
    const Cs = (0.1 * 1200) / 900;
    const Fs = Cs * N; // the soil's resistance: the normal force acts ahead of the contact, so the ground's resultant passes through the hub
    const Fb = ((0.08 * 0.035) / 0.45) * N; // the hub's friction torque mu·N·r_j, held by a ground force F_b·r at the rim
    const T = Fs + Fb; // the team's pull at constant speed (horizontal balance)
    // Moments about the contact point: R·L + r·F_s (the offset normal force, e·N = r·F_s) = Σ m g (x − x_a) + h_y·T
    expect(R * L + 0.45 * Fs).toBeCloseTo(moment + 0.53 * T, 9);
    // The old single arm (all of it at h_y) gives a larger pole load: it hid yoke lift.
    expect((moment + 0.53 * (Cs + (0.08 * 0.035) / 0.45) * 137 * G) / (L + 0.53 * (Cs + (0.08 * 0.035) / 0.45))).toBeGreaterThan(R);
  });
});

describe('differential checks (mechanics note, section 3)', () => {
  const base = prepared(handSpec(), rigid);
  const R0 = staticPoleLoad(base, rigid).pole_N;
  const L = 2.25;

  it('moving the crew forward by d raises the pole load by m_crew*g*d/L', () => {
    for (const d of [10, 37.5, 120]) {
      const s = handSpec();
      s.crew[0].x_mm += d;
      const R = staticPoleLoad(prepared(s, rigid), rigid).pole_N;
      expect(R - R0).toBeCloseTo((80 * G * d) / 1000 / L, 9);
    }
  });

  it('with rolling resistance the same move raises it by m_crew*g*d/(L + c), c = (h_y − r)·C_s + h_y·C_b', () => {
    const data = dataWithGround('hand-rigid', 0.08, 0.08);
    const s = handSpec();
    s.crew[0].x_mm += 100;
    const R1 = staticPoleLoad(prepared(s, data), data).pole_N - staticPoleLoad(base, data).pole_N;
    const c = (0.53 - 0.45) * ((0.08 * 1200) / 900) + 0.53 * ((0.08 * 0.035) / 0.45);
    expect(R1).toBeCloseTo((80 * G * 0.1) / (L + c), 9);
  });

  it('adding a point load m at x raises the pole load by m*g*(x - x_a)/L', () => {
    for (const [m, x] of [[6, 450], [15, 100], [2.5, 2000]] as const) {
      const s = handSpec();
      s.loads = [{ name: 'test load', mass_kg: m, x_mm: x, z_mm: 800 }];
      const R = staticPoleLoad(prepared(s, rigid), rigid).pole_N;
      expect(R - R0).toBeCloseTo((m * G * (x - 250)) / 1000 / L, 9);
    }
  });
});
