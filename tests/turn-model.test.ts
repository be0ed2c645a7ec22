import { describe, expect, it } from 'vitest';
import { lateralAccelAt, tightestYokeRadius, turnModel } from '../src/core/model/turn.ts';
import { massModel } from '../src/core/model/mass-model.ts';
import { staticPoleLoad } from '../src/core/model/load-cases.ts';
import { G } from '../src/core/units/units.ts';
import { dataWithGround, handSpec, prepared } from './support/fixtures.ts';

const rulesData = dataWithGround('hand-rigid', 0);

describe('turn model', () => {
  it('SSF and the rollover threshold as defined for rollover ratings (NHTSA, 65 FR 34998, 1 June 2000)', () => {
    // "one half the track width, t, divided by h": t = 1.6 m, h = 0.9 m gives 0.889;
    // on a 10 m radius a rigid vehicle tips at sqrt(g*SSF*R) = 9.34 m/s (reference figures, Rollover).
    const s = handSpec();
    s.wheels.track_mm = 1600;
    const spec = prepared(s, rulesData);
    const mass = massModel(spec, rulesData);
    mass.rolling.z_mm = 900; // put the centre of mass at the reference height
    const t = turnModel(spec, rulesData, mass, staticPoleLoad(spec, rulesData).axle_N);
    expect(t.ssf).toBeCloseTo(0.889, 3);
    expect(t.rolloverAccel).toBeCloseTo(G * 0.8889, 3);
    // With no off-tracking (R_a = R_y) the chariot's rollover speed is the rigid vehicle's.
    expect(10 * Math.sqrt(t.rolloverAccel / 10)).toBeCloseTo(9.34, 2);
  });

  it('off-tracking of a single trailing axle: R_h = 10 m, L = 3 m gives 9.539 m and 0.461 m (reference figures, Off-tracking)', () => {
    const s = handSpec(); // axle at 250 mm
    s.pole.yoke_x_mm = 3250; // reach 3.0 m
    s.operation.turn_radius_m = 10;
    const spec = prepared(s, rulesData);
    const mass = massModel(spec, rulesData);
    const t = turnModel(spec, rulesData, mass, 1000);
    expect(t.reach).toBeCloseTo(3, 12);
    expect(t.axleRadius).toBeCloseTo(9.539, 3);
    expect(t.offTracking).toBeCloseTo(0.461, 3);
    expect(t.innerRadius).toBeCloseTo(Math.sqrt(91) - 0.8, 12);
    expect(t.wheelSpeedRatio).toBeCloseTo((Math.sqrt(91) - 0.8) / (Math.sqrt(91) + 0.8), 12);
  });

  it('lateral acceleration v^2 R_a / R_y^2 and the tightest radius that meets a limit (closed form, mechanics note section 4)', () => {
    const v = 6;
    const L = 2.5;
    expect(lateralAccelAt(v, 10, L)).toBeCloseTo((36 * Math.sqrt(100 - 6.25)) / 100, 12);
    expect(lateralAccelAt(v, 2, L)).toBe(0); // inside the pole reach: no steady turn
    for (const allowed of [1, 2.5, 4]) {
      const R = tightestYokeRadius(v, allowed, L);
      expect(lateralAccelAt(v, R, L)).toBeCloseTo(allowed, 9);
      expect(lateralAccelAt(v, R * 1.01, L)).toBeLessThan(allowed); // wider is within the limit
    }
    // A limit the turn never reaches: any radius beyond the reach will do.
    expect(tightestYokeRadius(1, 50, L)).toBe(L);
  });

  it('load transfer dN = m a h / t and vertical balance of the two wheels', () => {
    const spec = prepared(handSpec(), rulesData);
    const mass = massModel(spec, rulesData);
    const N = staticPoleLoad(spec, rulesData).axle_N;
    const t = turnModel(spec, rulesData, mass, N);
    expect(t.loadTransfer).toBeCloseTo((mass.rolling.mass_kg * t.lateralAccel * (mass.rolling.z_mm / 1000)) / 1.6, 9);
    expect(t.outerWheel + t.innerWheel).toBeCloseTo(N, 9);
    expect(t.outerLateral + t.innerLateral).toBeCloseTo(mass.rolling.mass_kg * t.lateralAccel, 9);
  });
});
