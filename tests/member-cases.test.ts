import { describe, expect, it } from 'vitest';
import { Analysis } from './support/analysis.ts';
import { crewAt } from '../src/core/model/load-cases.ts';
import { massModel } from '../src/core/model/mass-model.ts';
import { poleLoad } from '../src/core/model/pole-load.ts';
import { G } from '../src/core/units/units.ts';
import { prepared, readDemo, rulesData } from './support/fixtures.ts';

describe('member load cases', () => {
  const spec = prepared(readDemo('demo-rear-axle'));
  const a = new Analysis(spec, rulesData);
  const byId = (id: string) => a.memberCases.find((c) => c.id === id)!;
  const Crr = rulesData.grounds[spec.operation.ground].rolling_resistance.value;
  const pole = (s: typeof spec, accel: number) =>
    poleLoad({ parts: massModel(s, rulesData).parts.filter((p) => p.group === 'rolling'), axleX_mm: s.axle.x_mm, yokeX_mm: s.pole.yoke_x_mm, yokeZ_mm: s.pole.yoke_height_mm, accel_g: accel, rollingResistance: Crr });

  it('carries the load-duration class of the mechanics note, section 1', () => {
    expect(a.memberCases.map((c) => [c.id, c.duration])).toEqual([
      ['dead', 'permanent'], ['standing', 'short'], ['bump', 'instantaneous'], ['turn', 'short'], ['accelerating', 'short'], ['braking', 'short'], ['stopping-shock', 'instantaneous'],
    ]);
  });

  it('the dead case is the chariot without its crew', () => {
    const r = pole({ ...spec, crew: [] }, 0);
    expect(byId('dead').pole_N).toBeCloseTo(Math.abs(r.pole_N), 9);
    expect(byId('dead').wheel_N).toBeCloseTo(r.axle_N / 2, 9);
  });

  it('the stopping shock equals the balance model solved at twice the braking deceleration', () => {
    // Independent of the linear scaling the case uses: solve the pole load afresh at −2 × 0.3 g.
    const shock = Math.max(...(['as placed', 'forward', 'aft'] as const).map((p) => Math.abs(pole(crewAt(spec, p), -2 * spec.operation.braking_g).pole_N)));
    expect(byId('stopping-shock').pole_N).toBeCloseTo(shock, 6);
    expect(byId('stopping-shock').poleAxial_N).toBeCloseTo(2 * a.mass.rolling.mass_kg * spec.operation.braking_g * G, 9);
  });

  it('the bump case is the standing envelope times the ride model\'s wheel factor; the turn case is the outer wheel', () => {
    const k = a.bumpFactors.wheel;
    expect(k.source).toMatch(/^ride model/);
    expect(byId('bump').wheel_N).toBeCloseTo(k.value * byId('standing').wheel_N, 9);
    // the pole: the worst standing load plus the ride model's largest yoke force above standing
    expect(byId('bump').pole_N).toBeCloseTo(byId('standing').pole_N + Math.max(0, a.bumpFactors.yokeIncrease_N!), 9);
    expect(byId('turn').wheel_N).toBe(a.turn.outerWheel);
    expect(byId('turn').wheelLateral_N).toBe(a.turn.outerLateral);
  });
});
