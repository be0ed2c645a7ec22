import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, deepMerge, rulesData, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

// The hand spec runs on a test ground of its own.
const rigid = dataWithGround('hand-rigid', 0);

const RULE = 'member.yoke';
const one = async (raw: unknown, data = rulesData) => (await findingsOf(RULE, raw, {}, data))[0];

describe(RULE, () => {
  it('passes for the rear-axle demo', async () => {
    const f = await one(readDemo('demo-rear-axle'));
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('yoke');
    expect(f.subject_label).toBe('yoke between the necks');
    expect(f.message_key).toBe('within');
  });

  it('hand calculation: M = R·s/4 + w·s²/8 on a 50 × 50 yoke, necks 700 mm apart', async () => {
    // Roark, Table 8.1: centre load W l/4 and uniform load w l²/8 on a simply supported span.
    const raw = handSpec();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const f = await one(raw, rigid);
    const w = (4 * G) / 1100; // measured 4 kg over 1100 mm, N/mm
    const W = 50 ** 3 / 6;
    expect(stepsOf(f, 'w = m_yoke·g / yoke length')[0].result).toBeCloseTo(w, 12);
    const gov = a.memberCases.find((c) => c.id === f.load_case)!;
    expect(f.params.case).toBe(gov.title);
    const M = (gov.pole_N * 700) / 4 + (w * gov.gravityFactor * 700 ** 2) / 8;
    expect(governingStep(f, 'M = R_pole·s/4 + w·s²/8').result).toBeCloseTo(M, 6);
    expect(f.value).toBeCloseTo(M / W, 9);
    // Every case but the design turn is worked.
    expect(stepsOf(f, 'M = R_pole·s/4 + w·s²/8')).toHaveLength(a.memberCases.length - 1);
  });

  it('fails a lath of a yoke on wide-set necks', async () => {
    const f = await one(deepMerge(readDemo('demo-rear-axle'), { yoke: { width_mm: 20, height_mm: 20, neck_spacing_mm: 1000 } }));
    expect(f.severity).toBe('fail');
    expect(f.message_key).toBe('over');
    expect(f.fix).toMatch(/Deepen the yoke/);
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('teaching-flawed'), (f) => f[0]);
  });
});
