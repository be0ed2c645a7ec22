import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { dataWithGround, deepMerge, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

const rigid = dataWithGround('hand-rigid', 0);
const RULE = 'wheel.spoke-tenon';

/** The hand spec's wheel: four spokes (35 × 30 mm white ash), a bent felloe in two halves, a rock-elm nave. */
const fourSpokes = () => deepMerge(handSpec(), { wheels: { spokes: 4, felloe: { pieces: 2, bend_radius_mm: 405 } } });

describe(RULE, () => {
  it('passes the central-axle demo', async () => {
    const f = (await findingsOf(RULE, readDemo('demo-two-crew')))[0];
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('wheel.spoke.tenon');
  });

  it('hand statics: with the contact under a spoke that spoke takes the whole wheel load; the stresses by hand', async () => {
    // Contact under a spoke of a four-spoke wheel: the spoke beneath carries P and the rim is not bent,
    // the others stand slack (statics of the rim: Σ F cos θ = P). No other contact position loads one
    // spoke more, so F = P of the case.
    const raw = fourSpokes();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const found = await findingsOf(RULE, raw, {}, rigid);
    const f = found[0];
    const gov = a.memberCases.find((c) => c.id === f.load_case)!;
    const P = gov.wheel_N;
    // A_tenon = 35 × 30/3 = 350 mm²; A_ef = (30 + 30) × 35 − 350 = 1750 mm² (the shorter face, 30 mm, along the host's grain).
    expect(stepsOf(f, 'A_tenon')[0].result).toBeCloseTo(350, 9);
    expect(stepsOf(f, 'A_ef')[0].result).toBeCloseTo(1750, 9);
    const steps = (formula: string) => stepsOf(f, formula).map((s) => s.result!);
    const caseIndex = a.memberCases.indexOf(gov);
    expect(steps('σ_c,0 = F/A_tenon')[caseIndex] / (P / 350)).toBeCloseTo(1, 6);
    expect(steps('σ_c,90 = F/A_ef on the nave')[caseIndex] / (P / 1750)).toBeCloseTo(1, 6);
    expect(steps('σ_c,90 = F/A_ef on the felloe')[caseIndex] / (P / 1750)).toBeCloseTo(1, 6);
    // The governing check is a bearing across the grain: the nave's rock elm (8.5 MPa across, 48.6 along, Wood
    // Handbook Table 5-3a) is far weaker across than the ash tenon along its grain.
    expect(f.params.mode).toMatch(/across the (nave|felloe) grain/);
    expect(governingStep(f, 'f_c,0,d').formula).toContain('f_c,0,k');
  });

  it('the bearing stress falls with a larger extension along the grain', async () => {
    const raw = fourSpokes();
    const lo = (await findingsOf(RULE, raw, { bearing_extension_mm: 0 }, rigid))[0];
    const hi = (await findingsOf(RULE, raw, { bearing_extension_mm: 30 }, rigid))[0];
    // (30 × 35 − 350) against (60 × 35 − 350): 700 mm² against 1750 mm².
    expect(lo.value! / hi.value!).toBeCloseTo(1750 / 700, 9);
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('demo-two-crew'), (f) => f[0]);
  });
});
