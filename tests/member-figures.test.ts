import { describe, expect, it } from 'vitest';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { G } from '../src/core/units/units.ts';
import { dataWithGround, handSpec, readDemo, rulesData } from './support/fixtures.ts';

// The hand spec runs on a test ground of its own.
const rigid = dataWithGround('hand-rigid', 0);

function check(raw: unknown, data = rulesData) {
  const p = prepareSpec(raw, data);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return runCheck(p.spec, p.entries, data);
}

describe('member figures', () => {
  it('hand calculation on the hand spec', () => {
    const r = check(handSpec(), rigid);
    const fig = r.figures;
    // Axle: N_w = axle load / 2 at a = (1600 − 900)/2 = 350 mm on 70 × 70 (W = 70³/6).
    expect(fig.axle_stress_static).toEqual({ value: expect.any(Number), unit: 'MPa' });
    expect(fig.axle_stress_static.value).toBeCloseTo(((fig.axle_load.value / 2) * 350) / (70 ** 3 / 6), 9);
    // Pole: R_pole = yoke load − yoke weight, reach 2500 − 500 = 2000 mm, 60 × 60 (W = 60³/6), level (dz = 0).
    const R = fig.yoke_load.value - r.mass.yoke_mass_kg * G;
    expect(fig.pole_stress_static.value).toBeCloseTo((R * 2000) / (60 ** 3 / 6), 9);
    // Euler: π² × 12000 (1 − 1.645 × 0.22) × 60⁴/12 / 2000², N (Wood Handbook Table 5-3a, white ash MOE at 12 %).
    expect(fig.pole_buckling_load.value).toBeCloseTo((Math.PI ** 2 * 12000 * (1 - 1.645 * 0.22) * (60 ** 4 / 12)) / 2000 ** 2, 6);
    expect(fig.pole_buckling_load.unit).toBe('N');
  });

  it('every demo gives the three figures', () => {
    for (const name of ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed']) {
      const fig = check(readDemo(name)).figures;
      for (const k of ['axle_stress_static', 'pole_stress_static', 'pole_buckling_load']) expect(Number.isFinite(fig[k].value), `${name} ${k}`).toBe(true);
    }
  });
});
