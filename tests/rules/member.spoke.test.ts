import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { bucklingFactor } from '../../src/core/model/timber/buckling-factor.ts';
import { dataWithGround, deepMerge, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';
import { bySubjectId, expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

// The hand spec runs on a test ground of its own.
const rigid = dataWithGround('hand-rigid', 0);

const RULE = 'member.spoke';
const crushing = bySubjectId('wheel.spoke');
const buckling = bySubjectId('wheel.spoke.strut');

describe(RULE, () => {
  it('passes the central-axle demo in crushing and buckling', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found.map((f) => [f.subject, f.severity, f.message_key])).toEqual([
      ['wheel.spoke', 'pass', 'within'],
      ['wheel.spoke.strut', 'pass', 'bucklingWithin'],
    ]);
  });

  it('hand calculation: crushing N/A and the Euler load over the free length', async () => {
    // handSpec: 35 × 30 mm white ash spokes; free length = 900/2 − 45 (felloe) − 150/2 (nave) = 330 mm.
    const raw = handSpec();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const found = await findingsOf(RULE, raw, {}, rigid);
    const c = crushing(found);
    // The governing case by hand: the highest N_w/A over f_c,0,d = 51.1 × (1 − 1.645 × 0.18) × 0.6 (sawn)
    // × k_mod / γ_M of each case (EN 1995-1-1 Tables 3.1 and 2.3).
    const kModOf = { permanent: 0.6, long: 0.7, medium: 0.8, short: 0.9, instantaneous: 1.1 } as const;
    const u = (x: (typeof a.memberCases)[number]) => x.wheel_N / (35 * 30) / ((51.1 * (1 - 1.645 * 0.18) * 0.6 * kModOf[x.duration]) / x.gammaM);
    const gov = a.memberCases.reduce((w, x) => (u(x) > u(w) ? x : w));
    expect(c.load_case).toBe(gov.id);
    expect(c.value).toBeCloseTo(gov.wheel_N / (35 * 30), 9);
    expect(c.utilisation!).toBeCloseTo(u(gov), 9);
    expect(governingStep(c, 'σ_c = N_w/A').result).toBeCloseTo(gov.wheel_N / (35 * 30), 9);
    // Euler: E_0.05 = 12000 × (1 − 1.645 × 0.22) (Wood Handbook Table 5-3a, 12 %), I_min = 35 × 30³/12, K = 1.
    const b = buckling(found);
    const Ncr = (Math.PI ** 2 * 12000 * (1 - 1.645 * 0.22) * ((35 * 30 ** 3) / 12)) / 330 ** 2;
    expect(stepsOf(b, 'L = felloe inner radius − nave radius')[0].result).toBeCloseTo(330, 12);
    expect(stepsOf(b, 'I_min')[0].result).toBeCloseTo((35 * 30 ** 3) / 12, 9);
    const euler = stepsOf(b, 'N_cr = π²·E_0.05·I_min/(K·L)²')[0];
    expect(euler.substituted).toBe('π² × 7657 × 78750 / (1 × 330)²');
    expect(euler.result).toBeCloseTo(Ncr, 6);
    // The buckling resistance of the governing case: k_c·f_c,0,d·A, with k_c from λ_rel = √(f_c,0,k·A/N_cr).
    // Clear-wood f_c,0,k = 51.1 × (1 − 1.645 × 0.18) MPa (Wood Handbook Table 5-3a, white ash at 12 %).
    const lambda = stepsOf(b, 'λ_rel = √(f_c,0,k·A / N_cr)')[0].result!;
    expect(lambda).toBeCloseTo(Math.sqrt((51.1 * (1 - 1.645 * 0.18) * 35 * 30) / Ncr), 9);
    const fcd = governingStep(b, 'f_c,0,d').result!;
    expect(b.limit).toBeCloseTo(bucklingFactor(lambda, 0.2, 0.3) * fcd * 35 * 30, 6);
    // Every member case is worked in both checks.
    expect(stepsOf(c, 'σ_c = N_w/A')).toHaveLength(a.memberCases.length);
    expect(stepsOf(b, 'N_b = k_c·f_c,0,d·A')).toHaveLength(a.memberCases.length);
    // The buckling constants of EN 1995-1-1 section 6.3.2 are cited by id.
    expect(b.sources).toEqual(expect.arrayContaining(['en-1995-1-1-6-3-2', 'design-basis-members']));
  });

  it('k_c of EN 1995-1-1 section 6.3.2 against a hand value and its bounds', () => {
    // λ_rel = 1, β_c = 0.2: k = 0.5 × (1 + 0.2 × 0.7 + 1) = 1.07; k_c = 1/(1.07 + √(1.07² − 1)) = 1/1.45066 = 0.68934 (hand calculation).
    expect(bucklingFactor(1, 0.2, 0.3)).toBeCloseTo(0.68934, 5);
    expect(bucklingFactor(0.3, 0.2, 0.3)).toBe(1);
    expect(bucklingFactor(0.3 + 1e-9, 0.2, 0.3)).toBeCloseTo(1, 6);
    // Never above the Euler load: k_c ≤ 1/λ_rel².
    for (const l of [0.5, 1, 1.5, 2, 3, 5]) expect(bucklingFactor(l, 0.2, 0.3)).toBeLessThanOrEqual(1 / (l * l));
  });

  it('the buckling constants are rule parameters: a threshold above λ_rel leaves k_c = 1', async () => {
    const raw = handSpec();
    const b = buckling(await findingsOf(RULE, raw, { slenderness_threshold: 10 }, rigid));
    expect(stepsOf(b, 'λ_rel ≤ λ_rel,0: no reduction, k_c')[0].result).toBe(1);
    const fcd = governingStep(b, 'f_c,0,d').result!;
    expect(b.limit).toBeCloseTo(fcd * 35 * 30, 9);
  });

  it('fails spokes cut to sticks, in buckling first', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { wheels: { spoke: { width_mm: 12, thickness_mm: 10 } } }));
    expect(buckling(found).severity).toBe('fail');
    expect(buckling(found).message_key).toBe('bucklingOver');
    expect(crushing(found).utilisation!).toBeLessThan(buckling(found).utilisation!);
  });

  it('fails crushing of a short, thin spoke', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { wheels: { spoke: { width_mm: 8, thickness_mm: 8 }, nave: { diameter_mm: 500, bore_mm: 76 } } }));
    expect(crushing(found).severity).toBe('fail');
    expect(crushing(found).message_key).toBe('over');
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: crushing and buckling equal to their limits pass', async () => {
    const raw = readDemo('teaching-flawed');
    await expectUtilisationBoundary(RULE, raw, crushing);
    await expectUtilisationBoundary(RULE, raw, buckling);
  });
});
