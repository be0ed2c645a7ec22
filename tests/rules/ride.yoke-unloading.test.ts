import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'ride.yoke-unloading';

describe(RULE, () => {
  it('passes when the pole rests heavily on the yoke', async () => {
    const found = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(found.map((f) => [f.subject, f.load_case])).toEqual([
      ['ride.ridge', 'ridge'],
      ['ride.one-wheel', 'one-wheel'],
    ]);
    expect(found.every((f) => f.severity === 'pass' && f.value! > 0)).toBe(true);
    // A least force of 0 N (design basis, section 8): a minimum of zero has no utilisation.
    expect(found[0].limit).toBe(0);
    expect(found[0].utilisation).toBeNull();
  });

  it('reports the standing yoke force as the balance model gives it', async () => {
    // Standing, the ride model's yoke force equals the static pole load of the balance rules (design basis, sections 3 and 8).
    const raw = readDemo('demo-rear-axle');
    const [f] = await findingsOf(RULE, raw);
    const analysis = new Analysis(prepared(raw), rulesData);
    expect(f.params.static as number).toBeCloseTo(analysis.staticCase.pole_load_N, 6);
  });

  it("warns when the central axle's light pole load swings below zero over a ridge", async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } }));
    const ridge = found.find((f) => f.load_case === 'ridge')!;
    expect(ridge.severity).toBe('warning');
    expect(ridge.value!).toBeLessThan(0);
    expect(ridge.working_text).toContain('standing');
  });

  it('boundary: a least yoke force equal to the limit passes, a hair above it warns', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [at] = await findingsOf(RULE, raw, { 'yoke_force_N.hard': probe.value! });
    expect(at.severity).toBe('pass');
    expect(at.utilisation).toBe(1);
    const [over] = await findingsOf(RULE, raw, { 'yoke_force_N.hard': probe.value! * (1 + 1e-9) });
    expect(over.severity).toBe('warning');
  });

  it('says so, and does not pass, where the ride model was not run (a statics-only run)', () => {
    const rule = RULES.find((r) => r.id === RULE)!;
    const spec = prepared(readDemo('demo-two-crew'));
    const found = runRules([rule], spec, rulesData, new Analysis(spec, rulesData, undefined, { ride: false }));
    expect(found.map((f) => [f.severity, f.code])).toEqual([['advice', 2824]]);
  });
});
