// Records of a floor held and let go (a pluck), not dropped on: the record
// sits on its rest level, steps to the held level (the floor pulled down or
// up), holds, and rings after the release. The estimator must find the release
// and read the free vibration after it, for either sign of the step. The
// records are the closed form of a linear floor let go from rest
// (syntheticRelease), with seeded noise.
import { describe, expect, it } from 'vitest';
import { syntheticRelease, type SyntheticRelease } from '../../scripts/synthetic-drop-record.ts';
import { estimateFloorTest } from '../../src/core/floor-test/estimate-floor-test.ts';
import { refusalCode } from './refusal-code.ts';
import { findRelease } from '../../src/core/floor-test/release.ts';
import { noiseLevel } from '../../src/core/floor-test/noise-level.ts';

const BASE: SyntheticRelease = { held_mm: 10, natural_frequency_hz: 6, damping_ratio: 0.08, noise_mm: 0.05, pull_s: 0.1, release_s: 0.5, seed: 7 };
// The drop tests' tolerances (estimate-floor-test.test.ts): frequency within 0.5 %, damping ratio within 5 % of itself.
const FREQ_TOL = 0.005;
const ZETA_TOL = 0.05;

describe('a floor held and let go', () => {
  const cases: [number, number, number, number, number][] = [
    // held mm, f_n Hz, zeta, pull s, release s
    [10, 6, 0.08, 0.1, 0.5],
    [-10, 6, 0.08, 0.1, 0.5],
    [8, 4, 0.03, 0.05, 0.3],
    [-8, 9, 0.15, 0.3, 0.6],
    [6, 12, 0.05, 0.02, 0.1],
  ];
  it.each(cases)('held %s mm, f_n %s Hz, zeta %s, pulled at %s s, let go at %s s', (held_mm, f_hz, zeta, pull_s, release_s) => {
    const rec = syntheticRelease({ ...BASE, held_mm, natural_frequency_hz: f_hz, damping_ratio: zeta, pull_s, release_s });
    const e = estimateFloorTest(rec, 40);
    expect(Math.abs(e.natural_frequency_hz / f_hz - 1)).toBeLessThan(FREQ_TOL);
    expect(Math.abs(e.damping_ratio_fit / zeta - 1)).toBeLessThan(ZETA_TOL);
    expect(Math.abs(e.damping_ratio_log_decrement / zeta - 1)).toBeLessThan(ZETA_TOL);
    // The fit starts at the first turning point after the release: half a damped period after it.
    const half = 1 / (2 * f_hz * Math.sqrt(1 - zeta ** 2));
    expect(e.free_vibration.start_s).toBeCloseTo(release_s + half, 1);
  });

  it('finds the release at the end of the hold, at the held level', () => {
    const rec = syntheticRelease(BASE);
    const r = findRelease(rec.t_s, rec.x_mm, noiseLevel(rec.x_mm));
    expect(r).not.toBeNull();
    expect(rec.t_s[r!.index]).toBeGreaterThan(BASE.release_s - 0.03);
    expect(rec.t_s[r!.index]).toBeLessThanOrEqual(BASE.release_s + 0.03);
    expect(r!.level_mm).toBeCloseTo(BASE.held_mm, 1);
    expect(estimateFloorTest(rec, 40).notes.join(' ')).toMatch(/let go at/);
  });

  it('a record that starts on the hold reads the same as before (no release needed)', () => {
    const rec = syntheticRelease({ ...BASE, pull_s: 0 });
    const e = estimateFloorTest(rec, 40);
    expect(Math.abs(e.natural_frequency_hz / BASE.natural_frequency_hz - 1)).toBeLessThan(FREQ_TOL);
    expect(Math.abs(e.damping_ratio / BASE.damping_ratio - 1)).toBeLessThan(ZETA_TOL);
  });
});

describe('records that are not a free vibration', () => {
  it('a square wave is refused by the fit check, not by a fault of the fitting library', () => {
    const t = Array.from({ length: 2000 }, (_, i) => i / 1000);
    expect(refusalCode(() => estimateFloorTest({ t_s: t, x_mm: t.map((_, i) => (Math.floor(i / 100) % 2 ? 5 : -5)) }, 40))).toBe(2914);
  });
});
