import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { figureOrReason, splitFigures } from '../../src/core/result/figure.ts';
import { RIDE_FIGURES } from '../../src/core/ride/ride-figures.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { deepMerge, readDemo, rulesData } from '../support/fixtures.ts';

// The ride model's figures: each a finite number, or left out of `figures`
// and listed in `figures_not_applicable` with the reason.

function check(raw: unknown, ride = true) {
  const p = prepareSpec(raw, rulesData);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return runCheck(p.spec, p.entries, rulesData, { ride });
}

const allFinite = (figures: Record<string, { value: number }>) => Object.values(figures).every((f) => Number.isFinite(f.value));

describe('figureOrReason', () => {
  it('keeps a finite value and gives the reason for NaN, Infinity, null or none', () => {
    expect(figureOrReason(2.5, '1', 'why')).toEqual({ value: 2.5, unit: '1' });
    for (const v of [NaN, Infinity, -Infinity, null, undefined]) expect(figureOrReason(v, '1', 'why')).toEqual({ not_applicable: 'why' });
    const split = splitFigures({ a: { value: 1, unit: 'mm' }, b: { not_applicable: 'no b' }, c: { value: NaN, unit: 'N' } });
    expect(split.figures).toEqual({ a: { value: 1, unit: 'mm' } });
    expect(Object.keys(split.figures_not_applicable)).toEqual(['b', 'c']);
  });
});

describe('ride figures', () => {
  it('the demo: the routine and stone wheel factors, peak ground force over static, and every ride figure finite', () => {
    const r = check(readDemo('demo-two-crew'));
    for (const name of RIDE_FIGURES) expect(r.figures, name).toHaveProperty(name);
    expect(r.figures.wheel_dynamic_factor_routine.unit).toBe('1');
    const ride = r.ride!.cases;
    const peak = (ids: string[]) => Math.max(...ride.filter((c) => ids.includes(c.case)).flatMap((c) => c.wheels.map((w) => w.dlf)));
    expect(r.figures.wheel_dynamic_factor_routine.value).toBeCloseTo(peak(['rough-ridge', 'rough-one-wheel']), 12);
    expect(r.figures.wheel_dynamic_factor_stone.value).toBeCloseTo(peak(['stone-ridge', 'stone-one-wheel']), 12);
    expect(allFinite(r.figures)).toBe(true);
    // The tuner did not run: its figure is listed as not applicable, with the reason.
    expect(r.figures).not.toHaveProperty('floor_damping_ratio_needed');
    expect(r.figures_not_applicable.floor_damping_ratio_needed).toContain('runs only where ride.decay');
  });

  it('a floor so lively its motion never settles in the run: no decay figure, the reason instead, never NaN', () => {
    const r = check(deepMerge(readDemo('demo-two-crew'), { floor_straps: { measured: { damping_ratio: 0.02, source: 'test floor' } } }));
    expect(r.ride!.cases.find((c) => c.case === 'drop')!.decayCycles).toBeNull();
    expect(r.figures).not.toHaveProperty('drop_decay_cycles');
    expect(r.figures_not_applicable.drop_decay_cycles).toMatch(/does not fall below 10\s% of its first amplitude within the 3\ss run/);
    expect(allFinite(r.figures)).toBe(true);
    // The tuner ran (the decay is slow) and found a damping that works.
    expect(r.figures.floor_damping_ratio_needed.value).toBeGreaterThan(0.02);
    expect(JSON.stringify(r.figures)).not.toMatch(/null|NaN|Infinity/);
  });

  it('a statics-only run: every ride figure is listed as not applicable', () => {
    const r = check(readDemo('demo-two-crew'), false);
    for (const name of RIDE_FIGURES) {
      expect(r.figures).not.toHaveProperty(name);
      expect(r.figures_not_applicable[name]).toContain('the ride model was not run');
    }
  });
});
