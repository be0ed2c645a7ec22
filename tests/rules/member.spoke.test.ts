import { describe, expect, it } from 'vitest';
import { Analysis } from '../../src/core/engine/analysis.ts';
import { bucklingFactor } from '../../src/core/rules/member/spoke.ts';
import { dataWithGround, deepMerge, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';

// The hand spec runs on a test ground of its own.
const rigid = dataWithGround('hand-rigid', 0);
import { bySubject, expectUtilisationBoundary } from '../support/limit-boundary.ts';

const RULE = 'member.spoke';
const crushing = bySubject('crushing');
const buckling = bySubject('buckling');

describe(RULE, () => {
  it('passes the central-axle demo in crushing and buckling', async () => {
    expect((await findingsOf(RULE, readDemo('demo-two-crew'))).map((f) => f.severity)).toEqual(['pass', 'pass']);
  });

  it('hand calculation: crushing N/A and the Euler load over the free length', async () => {
    // handSpec: 35 × 30 mm white ash spokes; free length = 900/2 − 45 (felloe) − 150/2 (nave) = 330 mm.
    const raw = handSpec();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const found = await findingsOf(RULE, raw, {}, rigid);
    const c = crushing(found);
    const bump = a.memberCases.find((x) => x.id === 'bump')!;
    expect(c.message).toContain('bump');
    expect(c.value).toBeCloseTo(bump.wheel_N / (35 * 30), 9);
    // Euler: E_0.05 = 12000 × (1 − 1.645 × 0.22), I_min = 35 × 30³/12, K = 1.
    const Ncr = (Math.PI ** 2 * 12000 * (1 - 1.645 * 0.22) * ((35 * 30 ** 3) / 12)) / 330 ** 2;
    expect(buckling(found).working_text).toContain(`N_cr = π²·E_0.05·I_min/(K·L)² = π² × 7657 × 78750 / (1 × 330.0)² = ${Ncr.toFixed(0)} N`);
  });

  it('k_c of EN 1995-1-1 section 6.3.2 against a hand value and its bounds', () => {
    // λ_rel = 1, β_c = 0.2: k = 0.5 × (1 + 0.2 × 0.7 + 1) = 1.07; k_c = 1/(1.07 + √(1.07² − 1)) = 1/1.45066 = 0.68934 (hand calculation).
    expect(bucklingFactor(1, 0.2, 0.3)).toBeCloseTo(0.68934, 5);
    expect(bucklingFactor(0.3, 0.2, 0.3)).toBe(1);
    expect(bucklingFactor(0.3 + 1e-9, 0.2, 0.3)).toBeCloseTo(1, 6);
    // Never above the Euler load: k_c ≤ 1/λ_rel².
    for (const l of [0.5, 1, 1.5, 2, 3, 5]) expect(bucklingFactor(l, 0.2, 0.3)).toBeLessThanOrEqual(1 / (l * l));
  });

  it('fails spokes cut to sticks, in buckling first', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { wheels: { spoke: { width_mm: 12, thickness_mm: 10 } } }));
    expect(buckling(found).severity).toBe('fail');
    expect(crushing(found).utilisation!).toBeLessThan(buckling(found).utilisation!);
  });

  it('fails crushing of a short, thin spoke', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { wheels: { spoke: { width_mm: 8, thickness_mm: 8 }, nave: { diameter_mm: 500, bore_mm: 76 } } }));
    expect(crushing(found).severity).toBe('fail');
  });

  it('boundary: crushing and buckling equal to their limits pass', async () => {
    const raw = readDemo('teaching-flawed');
    await expectUtilisationBoundary(RULE, raw, crushing);
    await expectUtilisationBoundary(RULE, raw, buckling);
  });
});
