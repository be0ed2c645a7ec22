import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { formatNumber, formatQuantity } from '../../src/core/format/number-format.ts';
import { deepMerge, findingsOf, fractionHitting, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'floor.strap-tension';
const THICK = { floor_straps: { width_mm: 30, thickness_mm: 12, pitch_mm: 32, pretension_N: 60 } };
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);
// Design basis, sections 1 and 5: f_d = f_t × η_slot / SF. Rawhide f_t = 20 MPa
// (rules/materials/leathers.yaml, from memory), η_slot = 0.6 and SF = 4
// (rules/limits/floor.yaml): f_d = 20 × 0.6 / 4 = 3 MPa by hand.
const FD = 3;

describe(RULE, () => {
  it('passes thick straps, standing and at a bump', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    const k = new Analysis(prepared(raw(THICK)), rulesData).bumpFactors.crew.value;
    expect(found.map((f) => f.subject)).toEqual(['floor.strap', 'floor.strap']);
    expect(found.map((f) => f.load_case)).toEqual(['static', 'bump']);
    expect(found.map((f) => f.subject_label)).toEqual(['the most loaded strap, crew standing', `the most loaded strap, bump, ${formatNumber(k)} × crew weight`]);
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass']);
    expect(found.map((f) => f.message_key)).toEqual(['within', 'within']);
    expect(found[0].fix).toMatch(/^None needed\. Keep the straps dry: wet rawhide keeps about 40\s% of its strength/);
  });

  it('fails thin straps; the stress and design strength are those of the floor model and the rules data', async () => {
    const spec = prepared(raw({ floor_straps: { width_mm: 20, thickness_mm: 3 } }));
    const a = new Analysis(spec, rulesData);
    const bump = a.floorBump;
    const [, atBump] = await findingsOf(RULE, raw({ floor_straps: { width_mm: 20, thickness_mm: 3 } }));
    expect(atBump.severity).toBe('fail');
    expect(atBump.message_key).toBe('over');
    // σ = T_max / (b × t), a 20 × 3 mm strap.
    expect(atBump.value).toBe(bump.maxTension_N / (20 * 3));
    expect(atBump.params).toMatchObject({ case: 'bump', tension: bump.maxTension_N, where: bump.maxTensionAt });
    expect(atBump.limit).toBeCloseTo(FD, 12);
    expect(atBump.params.strength as number).toBeCloseTo(FD, 12);
    expect(atBump.utilisation!).toBeCloseTo(atBump.value! / FD, 12);
    expect(atBump.utilisation).toBeGreaterThan(1);
    const fd = atBump.working.find((s) => s.formula === 'f_d = f_t × η_slot / SF')!;
    expect(fd.substituted).toBe('20 × 0.6 / 4');
    expect(fd.result).toBeCloseTo(FD, 12);
    // The finding says which dynamic factor it used and where it came from.
    expect(atBump.working_text).toContain(`factor on the crew's weight ${formatNumber(bump.factor, '', 4)}`);
    expect(atBump.working_text).toContain(a.bumpFactors.crew.source);
    const k = a.bumpFactors.crew;
    expect(atBump.sources).toEqual(expect.arrayContaining(['design-basis-floor', 'design-basis-materials', 'from-memory', k.from === null ? 'from-memory' : 'design-basis-ride']));
  });

  it('warns between the advisory utilisation and the design strength, with the utilisation on the design strength', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 30, thickness_mm: 7.5, pitch_mm: 32, pretension_N: 80 } }));
    const [standing, atBump] = found;
    expect(standing.severity).toBe('pass');
    expect(atBump.severity).toBe('warning');
    // The advisory level is 0.8 of f_d = 2.4 MPa, the hard level 1.0 of f_d = 3 MPa (rules/limits/floor.yaml).
    expect(atBump.params.advisory as number).toBeCloseTo(0.8 * FD, 12);
    expect(atBump.params.hard as number).toBeCloseTo(FD, 12);
    expect(atBump.limit).toBeCloseTo(FD, 12);
    expect(atBump.message).toContain(`the advisory limit is ${formatQuantity(0.8 * FD, 'MPa')} and the hard limit ${formatQuantity(FD, 'MPa')}`);
    // Demand over the design strength: between 0.8 and 1 for a warning.
    expect(atBump.utilisation!).toBeCloseTo(atBump.value! / FD, 12);
    expect(atBump.utilisation!).toBeGreaterThan(0.8);
    expect(atBump.utilisation!).toBeLessThanOrEqual(1);
  });

  it('boundary: a stress equal to the design strength is within it', async () => {
    const r = raw(THICK);
    const [, atBump] = await findingsOf(RULE, r);
    const ft = rulesData.leathers.rawhide.tensile_strength_MPa.value;
    const eta = fractionHitting(atBump.value!, ft);
    const at = (await findingsOf(RULE, r, { safety_factor: 1, slot_efficiency: eta, 'utilisation.advisory': 1 }))[1];
    expect(at.limit).toBe(atBump.value);
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, r, { safety_factor: 1, slot_efficiency: eta * (1 - 1e-9), 'utilisation.advisory': 1 }))[1];
    expect(over.severity).toBe('fail');
  });

  it('boundary: a utilisation equal to the advisory level passes, a hair above warns', async () => {
    const r = raw(THICK);
    const [, atBump] = await findingsOf(RULE, r);
    const u = fractionHitting(atBump.value!, FD);
    const at = (await findingsOf(RULE, r, { 'utilisation.advisory': u }))[1];
    expect(at.severity).toBe('pass');
    expect(at.params.advisory).toBe(atBump.value);
    const over = (await findingsOf(RULE, r, { 'utilisation.advisory': u * (1 - 1e-9) }))[1];
    expect(over.severity).toBe('warning');
    expect(over.fix).toMatch(/^Use wider or thicker straps/);
  });

  it('fails, saying why, when the floor could not be solved', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 4, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.every((f) => f.severity === 'fail' && f.code === 2203 && f.message_key === 'notSolved' && f.value === null)).toBe(true);
    expect(found[0].message).toContain('max_nodes');
    expect(found.map((f) => f.load_case)).toEqual(['static', 'bump']);
  });
});
