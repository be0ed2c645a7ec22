import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { formatNumber, formatQuantity } from '../../src/core/format/number-format.ts';
import { deepMerge, findingsOf, fractionHitting, prepared, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const RULE = 'floor.strap-tension';
const THICK = { floor_straps: { width_mm: 30, thickness_mm: 12, pitch_mm: 32, pretension_N: 60 } };
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);
// Design basis, sections 1 and 5, the one leather chain: f_d = f_k × η_joint / γ_M. Rawhide f_k = 20 MPa
// (rules/materials/leathers.yaml, from memory), η_joint = 0.7 for a laced end (Shop Practice, belting)
// and γ_M = 1.5 in the fundamental combination (a judgement), 1.0 in the accidental one (EN 1990 6.11):
// by hand 20 × 0.7 / 1.5 = 9.333 MPa and 20 × 0.7 / 1.0 = 14 MPa.
const FD = (20 * 0.7) / 1.5;
const FD_ACCIDENTAL = 20 * 0.7;

describe(RULE, () => {
  it('checks the floor in its design states: standing and over rough ground (fundamental), the stone (accidental)', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    const a = new Analysis(prepared(raw(THICK)), rulesData);
    expect(found.map((f) => f.subject)).toEqual(['floor.strap', 'floor.strap', 'floor.strap']);
    expect(found.map((f) => [f.load_case, f.combination])).toEqual([
      ['static', 'fundamental'],
      ['rough-ground', 'fundamental'],
      ['stone', 'accidental'],
    ]);
    // The factors on the crew's weight: γ_Q = 1.5 standing; γ_Q (ψ_0 + φ − 1) over rough ground with
    // ψ_0 = 1 for the crew (EN 1990 eq. 6.10 with Table A1.2(B)); φ_stone × 1.0 on the stone (eq. 6.11).
    const phi = a.bumpFactors.crew.value;
    expect(a.floorDesign.factor).toBeCloseTo(1.5, 12);
    expect(a.floorDesignRough.factor).toBeCloseTo(1.5 * (1 + phi - 1), 12);
    expect(a.floorStone.factor).toBe(a.stoneFactors.crew.value);
    expect(found[1].subject_label).toBe(`the most loaded strap, rough ground, ${formatNumber(a.floorDesignRough.factor)} × crew weight`);
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass', 'pass']);
    expect(found.map((f) => f.limit)).toEqual([expect.closeTo(FD, 12), expect.closeTo(FD, 12), expect.closeTo(FD_ACCIDENTAL, 12)]);
    expect(found[0].fix).toMatch(/^None needed\. Keep the straps dry: wet rawhide keeps about 40\s% of its strength/);
  });

  it('fails thin straps; the stress and design strength are those of the floor model and the rules data', async () => {
    const r = raw({ floor_straps: { width_mm: 12, thickness_mm: 2 } });
    const a = new Analysis(prepared(r), rulesData);
    const rough = a.floorDesignRough;
    const [, atRough] = await findingsOf(RULE, r);
    expect(atRough.severity).toBe('fail');
    expect(atRough.message_key).toBe('over');
    // σ = T_max / (b × t), a 12 × 2 mm strap.
    expect(atRough.value).toBe(rough.maxTension_N / (12 * 2));
    expect(atRough.params).toMatchObject({ case: 'rough ground', tension: rough.maxTension_N, where: rough.maxTensionAt });
    expect(atRough.limit).toBeCloseTo(FD, 12);
    expect(atRough.params.strength as number).toBeCloseTo(FD, 12);
    expect(atRough.utilisation!).toBeCloseTo(atRough.value! / FD, 12);
    expect(atRough.utilisation).toBeGreaterThan(1);
    const fd = atRough.working.find((s) => s.formula.startsWith('f_d = f_k·η_joint/γ_M'))!;
    expect(fd.substituted).toBe('20 × 0.7 / 1.5');
    expect(fd.result).toBeCloseTo(FD, 12);
    // The finding says which dynamic factor it used and where it came from.
    expect(atRough.working_text).toContain(`factor on the crew's weight ${formatNumber(rough.factor, '', 4)}`);
    expect(atRough.working_text).toContain(a.bumpFactors.crew.source);
    expect(atRough.sources).toEqual(expect.arrayContaining(['design-basis-floor', 'design-basis-materials', 'shop-practice-belting', 'en-1990-6-10', ...a.bumpFactors.crew.sources]));
  });

  it('driven wet, the strength takes the wet factor of the material', async () => {
    const [dry] = await findingsOf(RULE, raw(THICK));
    const [wet] = await findingsOf(RULE, raw({ ...THICK, operation: { wet: true } }));
    // rules/materials/leathers.yaml: wet rawhide keeps 0.4 of its strength (from memory).
    expect(wet.limit! / dry.limit!).toBeCloseTo(0.4, 12);
    expect(wet.value).toBe(dry.value);
  });

  it('warns between the advisory utilisation and the design strength', async () => {
    const r = raw(THICK);
    const [, atRough] = await findingsOf(RULE, r);
    // A joint efficiency that puts the rough-ground stress at 0.9 of the design strength.
    const eta = atRough.value! / 0.9 / (20 / 1.5);
    const [, w] = await findingsOf(RULE, r, {}, withParams('leather-strength', { joint_efficiency: eta }));
    expect(w.severity).toBe('warning');
    expect(w.utilisation!).toBeCloseTo(0.9, 9);
    // The advisory level is 0.8 of f_d (rules/limits/floor.yaml).
    expect(w.params.advisory as number).toBeCloseTo(0.8 * w.limit!, 12);
    expect(w.message).toContain(`the advisory limit is ${formatQuantity(0.8 * w.limit!, 'MPa')} and the hard limit ${formatQuantity(w.limit, 'MPa')}`);
  });

  it('boundary: a stress equal to the design strength is within it', async () => {
    const r = raw(THICK);
    const [, atRough] = await findingsOf(RULE, r);
    const ft = rulesData.leathers.rawhide.tensile_strength_MPa.value;
    const eta = fractionHitting(atRough.value!, ft);
    const at = (await findingsOf(RULE, r, { 'utilisation.advisory': 1 }, withParams('leather-strength', { joint_efficiency: eta, gamma_M: 1 })))[1];
    // The limit on the value, or the nearest double above it.
    expect(at.limit!).toBeGreaterThanOrEqual(atRough.value!);
    expect(at.limit!).toBeCloseTo(atRough.value!, 12);
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, r, { 'utilisation.advisory': 1 }, withParams('leather-strength', { joint_efficiency: eta * (1 - 1e-9), gamma_M: 1 })))[1];
    expect(over.severity).toBe('fail');
  });

  it('boundary: a utilisation equal to the advisory level passes, a hair above warns', async () => {
    const r = raw(THICK);
    const [, atRough] = await findingsOf(RULE, r);
    const u = fractionHitting(atRough.value!, atRough.limit!);
    const at = (await findingsOf(RULE, r, { 'utilisation.advisory': u }))[1];
    expect(at.severity).toBe('pass');
    // The nearest double to the level puts the advisory limit on the value, or one rounding step above it.
    expect(at.params.advisory as number).toBeGreaterThanOrEqual(atRough.value!);
    expect(at.params.advisory as number).toBeCloseTo(atRough.value!, 12);
    const over = (await findingsOf(RULE, r, { 'utilisation.advisory': u * (1 - 1e-9) }))[1];
    expect(over.severity).toBe('warning');
    expect(over.fix).toMatch(/^Use wider or thicker straps/);
  });

  it('fails, saying why, when the floor could not be solved', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 5, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.every((f) => f.severity === 'fail' && f.code === 2203 && f.message_key === 'notSolved' && f.value === null)).toBe(true);
    expect(found[0].message).toContain('max_nodes');
    expect(found.map((f) => f.load_case)).toEqual(['static', 'rough-ground', 'stone']);
  });
});
