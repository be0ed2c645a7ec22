// The estimator against synthetic drop records made from a known frequency and
// damping, with seeded noise, so each run sees the same records.
import { describe, expect, it } from 'vitest';
import { syntheticDrop, normal, type SyntheticDrop } from '../../scripts/synthetic-drop-record.ts';
import { estimateFloorTest } from '../../src/core/floor-test/estimate-floor-test.ts';
import { dampingFromDecrement } from '../../src/core/floor-test/log-decrement.ts';
import { noiseLevel } from '../../src/core/floor-test/noise-level.ts';
import { refusalCode } from './refusal-code.ts';

const BASE: SyntheticDrop = {
  mass_kg: 40,
  natural_frequency_hz: 6,
  damping_ratio: 0.08,
  drop_height_mm: 20,
  noise_mm: 0.15,
  sample_rate_hz: 1000,
  duration_s: 2.5,
  lead_s: 0.1,
  seed: 1,
};

// Tolerances stated for noisy records (noise about 1 % of the first swing):
// frequency within 0.5 %, damping ratio within 5 % of itself.
const FREQ_TOL = 0.005;
const ZETA_TOL = 0.05;

describe('estimateFloorTest on noisy synthetic records', () => {
  const cases: [number, number, number, number][] = [
    // f_n Hz, zeta, noise mm, seed
    [6, 0.08, 0.15, 1],
    [4, 0.03, 0.1, 2],
    [9, 0.15, 0.1, 3],
    [6, 0.121, 0.05, 4],
    [12, 0.2, 0.02, 5],
  ];
  it.each(cases)('f_n %s Hz, zeta %s, noise %s mm (seed %s)', (f, zeta, noise, seed) => {
    const rec = syntheticDrop({ ...BASE, natural_frequency_hz: f, damping_ratio: zeta, noise_mm: noise, seed });
    const e = estimateFloorTest(rec, BASE.mass_kg);
    expect(Math.abs(e.natural_frequency_hz / f - 1)).toBeLessThan(FREQ_TOL);
    expect(Math.abs(e.damping_ratio_fit / zeta - 1)).toBeLessThan(ZETA_TOL);
    expect(Math.abs(e.damping_ratio_log_decrement / zeta - 1)).toBeLessThan(ZETA_TOL);
    expect(e.damping_ratio).toBe(e.damping_ratio_fit);
    // k = M w^2 from the estimate; the synthetic floor's k is M (2 pi f)^2.
    const k = (BASE.mass_kg * (2 * Math.PI * f) ** 2) / 1000;
    expect(Math.abs(e.stiffness_N_per_mm / k - 1)).toBeLessThan(2 * FREQ_TOL + 1e-9);
    // The fit leaves only the noise, which the second differences found.
    expect(e.noise_mm / noise).toBeGreaterThan(0.85);
    expect(e.noise_mm / noise).toBeLessThan(1.15);
    expect(e.fit.rms_mm / noise).toBeLessThan(1.2);
    // The free vibration starts at the first peak, after the impact.
    expect(e.free_vibration.start_s).toBeGreaterThan(BASE.lead_s);
  });

  it('ends the free vibration where the swing sinks into the noise', () => {
    const quiet = estimateFloorTest(syntheticDrop({ ...BASE, noise_mm: 0.02 }), 40);
    const loud = estimateFloorTest(syntheticDrop({ ...BASE, noise_mm: 0.4 }), 40);
    expect(quiet.free_vibration.end_s).toBeGreaterThan(loud.free_vibration.end_s);
    expect(quiet.free_vibration.half_cycles).toBeGreaterThan(loud.free_vibration.half_cycles);
    // Every kept half-cycle stands at least 10 noise deviations tall.
    const heights = loud.extrema.slice(1).map((p, i) => Math.abs(p.x_mm - loud.extrema[i].x_mm));
    for (const h of heights) expect(h).toBeGreaterThanOrEqual(10 * loud.noise_mm);
  });

  it('reads a record that goes negative on impact the same way', () => {
    const rec = syntheticDrop(BASE);
    const up = estimateFloorTest({ t_s: rec.t_s, x_mm: rec.x_mm.map((v) => -v) }, 40);
    const down = estimateFloorTest(rec, 40);
    expect(up.natural_frequency_hz).toBeCloseTo(down.natural_frequency_hz, 6);
    expect(up.damping_ratio).toBeCloseTo(down.damping_ratio, 6);
  });
});

describe('the pieces against closed forms', () => {
  it('a noise-free record gives the decrement of its damping ratio', () => {
    const e = estimateFloorTest(syntheticDrop({ ...BASE, noise_mm: 0, duration_s: 1.5 }), 40);
    expect(e.damping_ratio_log_decrement).toBeCloseTo(0.08, 4);
    expect(e.damping_ratio_fit).toBeCloseTo(0.08, 5);
    expect(e.natural_frequency_hz).toBeCloseTo(6, 4);
    // Damped frequency f_d = f_n sqrt(1 - zeta^2).
    expect(e.damped_frequency_hz).toBeCloseTo(6 * Math.sqrt(1 - 0.08 ** 2), 3);
  });

  it('dampingFromDecrement inverts delta = 2 pi zeta / sqrt(1 - zeta^2)', () => {
    for (const z of [0.01, 0.121, 0.5]) expect(dampingFromDecrement((2 * Math.PI * z) / Math.sqrt(1 - z * z))).toBeCloseTo(z, 12);
    // The decay criterion of the mechanics note: ln(10)/3 per cycle is zeta 0.121.
    expect(dampingFromDecrement(Math.log(10) / 3)).toBeCloseTo(0.121, 3);
  });

  it('noiseLevel finds the deviation of white noise on a slow signal', () => {
    const r = normal(7);
    const x = Array.from({ length: 4000 }, (_, i) => 10 * Math.sin(i / 200) + 0.3 * r());
    expect(noiseLevel(x)).toBeGreaterThan(0.3 * 0.93);
    expect(noiseLevel(x)).toBeLessThan(0.3 * 1.07);
  });
});

describe('records the estimator refuses', () => {
  it('a record of noise alone: no drop seen', () => {
    const r = normal(3);
    const t = Array.from({ length: 500 }, (_, i) => i / 1000);
    expect(refusalCode(() => estimateFloorTest({ t_s: t, x_mm: t.map(() => 0.1 * r()) }, 40))).toBe(2912);
  });
  it('a floor that damps in one swing: too few half-cycles', () => {
    expect(refusalCode(() => estimateFloorTest(syntheticDrop({ ...BASE, damping_ratio: 0.6 }), 40))).toBe(2913);
  });
  it('a mass that is not positive', () => {
    expect(refusalCode(() => estimateFloorTest(syntheticDrop(BASE), 0))).toBe(2911);
  });
});
