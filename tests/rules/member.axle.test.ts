import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

const RULE = 'member.axle';
const one = async (raw: unknown) => (await findingsOf(RULE, raw))[0];

describe(RULE, () => {
  it('passes for the central-axle demo, governed by the worse of the design turn and the bump', async () => {
    const f = await one(readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('axle.arm');
    expect(f.subject_label).toBe('axle arm');
    expect(f.message_key).toBe('within');
    expect(f.code).toBe(2301);
    // Hand calculation (design basis, section 6): a = (1640 − 940)/2 = 350 mm, r = 470 mm,
    // W = 78 × 72²/6 mm³ at the bearing; the outer wheel's loads from the turn model, the bump's from the ride model's wheel factor.
    const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData);
    const bump = a.memberCases.find((c) => c.id === 'rough-ground')!;
    const turnM = a.turn.outerWheel * 350 + a.turn.outerLateral * 470;
    const bumpM = bump.wheel_N * 350;
    expect(stepsOf(f, 'a = (t − s)/2')[0].result).toBe(350);
    expect(f.params.mode).toBe('bending at the bearing');
    expect(f.load_case).toBe(turnM > bumpM ? 'turn' : 'bump');
    expect(f.value).toBeCloseTo(Math.max(turnM, bumpM) / ((78 * 72 * 72) / 6), 9);
    expect(governingStep(f, 'M = N_w·a').result).toBeCloseTo(Math.max(turnM, bumpM), 6);
    // Every case's three checks are worked: one shear and two bending checks a case.
    expect(stepsOf(f, 'τ = 1.5·N_w/A')).toHaveLength(a.memberCases.length);
    expect(stepsOf(f, 'f_m,d = f_m,k·k_select·k_mod/γ_M').length).toBe(2 * a.memberCases.length);
    expect(f.params.kMod).toBe(f.load_case === 'bump' ? 1.1 : 0.9);
    // The limit's source, the method's, the species' table and k_mod's.
    expect(f.sources).toEqual(expect.arrayContaining(['en-1995-1-1-2-4', 'design-basis-members', 'wood-handbook-2010-t5-3a', 'en-1995-1-1-t3-1', 'en-1995-1-1-t2-3']));
  });

  it('fails an axle cut down to 40 mm, at the arm inside the nave', async () => {
    const f = await one(deepMerge(readDemo('demo-two-crew'), { axle: { width_mm: 40, height_mm: 40 }, wheels: { nave: { bore_mm: 40 } } }));
    expect(f.severity).toBe('fail');
    expect(f.subject).toBe('axle.arm');
    expect(f.message_key).toBe('over');
    expect(f.params.mode).toMatch(/^bending at the (nave|bearing)$/);
    expect(f.utilisation!).toBeGreaterThan(1);
    expect(f.fix).toMatch(/Deepen the axle/);
  });

  it('a selected axle is stronger than a sawn one by k_select 0.8 / 0.6', async () => {
    // The axle's own grade, set both ways, so the stock grade of the demo does not matter.
    const raw = readDemo('demo-two-crew');
    const sawn = await one(deepMerge(raw, { axle: { grade: 'sawn' } }));
    const selected = await one(deepMerge(raw, { axle: { grade: 'selected' } }));
    expect(selected.limit! / sawn.limit!).toBeCloseTo(0.8 / 0.6, 12);
    expect(selected.value).toBe(sawn.value);
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('demo-rear-axle'), (f) => f[0]);
  });
});
