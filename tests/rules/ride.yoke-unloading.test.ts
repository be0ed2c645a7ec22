import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'ride.yoke-unloading';

describe(RULE, () => {
  it('passes when the pole rests heavily on the yoke; the stone, pulling no harder, is not reported apart', async () => {
    const found = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(found.map((f) => [f.subject, f.load_case, f.combination])).toEqual([
      ['ride.rough-ridge', 'rough-ground', 'characteristic'],
      ['ride.rough-one-wheel', 'rough-ground', 'characteristic'],
    ]);
    expect(found[0].working_text).toContain('stone strike under both wheels: least yoke force');
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

  it("warns when the central axle's light pole load swings below zero over a ridge of rough ground", async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { rough_ground: { height_mm: 30, length_mm: 800 } } }));
    const ridge = found.find((f) => f.subject === 'ride.rough-ridge')!;
    expect(ridge.severity).toBe('warning');
    expect(ridge.value!).toBeLessThan(0);
    expect(ridge.working_text).toContain('standing');
    expect(ridge.message).toContain('Over the rough-ground ridge across both tracks the yoke force falls to');
  });

  it('reports the stone apart where it pulls harder: accidental, advice at most', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } }));
    const stone = found.filter((f) => f.load_case === 'stone');
    expect(stone.map((f) => f.subject)).toContain('ride.stone-ridge');
    const ridge = stone.find((f) => f.subject === 'ride.stone-ridge')!;
    expect([ridge.severity, ridge.code, ridge.combination]).toEqual(['advice', 2826, 'accidental']);
    expect(ridge.value!).toBeLessThan(0);
    expect(ridge.message).toContain('At the stone strike under both wheels the yoke force falls to');
    // reported only where lower than over the rough ground of the same shape
    const rough = found.find((f) => f.subject === 'ride.rough-ridge')!;
    expect(ridge.value!).toBeLessThan(rough.value!);
  });

  it('boundary at the stone: a least yoke force equal to the limit passes, a hair above it gives advice', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } });
    const probe = (await findingsOf(RULE, raw)).find((f) => f.subject === 'ride.stone-ridge')!;
    const pick = async (v: number) => (await findingsOf(RULE, raw, { 'stone_yoke_force_N.hard': v })).find((f) => f.subject === 'ride.stone-ridge')!;
    expect((await pick(probe.value!)).severity).toBe('pass');
    expect((await pick(probe.value! + 1e-9 * Math.abs(probe.value!))).severity).toBe('advice');
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
