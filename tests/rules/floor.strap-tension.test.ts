import { ruleParam } from '../../src/core/data/param.ts';
import { describe, expect, it } from 'vitest';
import { Analysis } from '../../src/core/engine/analysis.ts';
import { deepMerge, findingsOf, fractionHitting, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'floor.strap-tension';
const THICK = { floor_straps: { width_mm: 30, thickness_mm: 10, pitch_mm: 32, pretension_N: 60 } };
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);

describe(RULE, () => {
  it('passes thick straps, standing and at a bump', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    const k = new Analysis(prepared(raw(THICK)), rulesData).bumpFactors.crew.value;
    expect(found.map((f) => f.subject)).toEqual(['crew standing', `bump, ${Number(k.toFixed(2))} × crew weight`]);
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass']);
  });

  it('fails thin straps; the stress and design strength are those of the floor model and the rules data', async () => {
    const spec = prepared(raw({ floor_straps: { width_mm: 20, thickness_mm: 3 } }));
    const bump = new Analysis(spec, rulesData).floorBump;
    const [, atBump] = await findingsOf(RULE, raw({ floor_straps: { width_mm: 20, thickness_mm: 3 } }));
    expect(atBump.severity).toBe('fail');
    expect(atBump.value).toBe(bump.maxTension_N / (20 * 3));
    // Mechanics note, sections 1 and 5: f_d = f_t × η_slot / SF, from rules/materials/leathers.yaml and rules/limits/floor.yaml.
    const lim = { slot_efficiency: ruleParam(rulesData, RULE, 'slot_efficiency'), safety_factor: ruleParam(rulesData, RULE, 'safety_factor') };
    const fd = (rulesData.leathers.rawhide.tensile_strength_MPa.value * lim.slot_efficiency.value) / lim.safety_factor.value;
    expect(atBump.limit).toBeCloseTo(fd, 12);
    expect(atBump.utilisation).toBeGreaterThan(1);
    // The finding says which dynamic factor it used and where it came from.
    expect(atBump.working_text).toContain('bump_dynamic_factor');
    expect(atBump.working_text).toContain(`factor ${rulesData.params['load-cases'].bump_dynamic_factor.value}`);
  });

  it('warns between the advisory utilisation and the design strength', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 30, thickness_mm: 7.5, pitch_mm: 32, pretension_N: 80 } }));
    const [standing, atBump] = found;
    expect(standing.severity).toBe('pass');
    expect(atBump.severity).toBe('warning');
    expect(atBump.message).toContain('advisory limit is 80 %');
  });

  it('boundary: a stress equal to the design strength is within it', async () => {
    const r = raw(THICK);
    const [, atBump] = await findingsOf(RULE, r);
    const ft = rulesData.leathers.rawhide.tensile_strength_MPa.value;
    const eta = fractionHitting(atBump.value!, ft);
    const at = (await findingsOf(RULE, r, { safety_factor: 1, slot_efficiency: eta, advisory_utilisation: 1 }))[1];
    expect(at.limit).toBe(atBump.value);
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, r, { safety_factor: 1, slot_efficiency: eta * (1 - 1e-9), advisory_utilisation: 1 }))[1];
    expect(over.severity).toBe('fail');
  });

  it('fails, saying why, when the floor could not be solved', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 4, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.every((f) => f.severity === 'fail' && f.code === 2203 && f.value === null)).toBe(true);
    expect(found[0].message).toContain('max_nodes');
  });
});
