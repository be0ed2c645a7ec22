import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, stepsOf } from '../support/member-support.ts';

const RULE = 'member.axle';
const one = async (raw: unknown) => (await findingsOf(RULE, raw))[0];

describe(RULE, () => {
  it('passes for the central-axle demo, governed by the case of the highest utilisation', async () => {
    const f = await one(readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('axle.arm');
    expect(f.subject_label).toBe('axle arm');
    expect(f.message_key).toBe('within');
    expect(f.code).toBe(2301);
    // Hand calculation (design basis, section 6): a = (1640 − 940)/2 = 350 mm, r = 470 mm,
    // W = 78 × 72²/6 mm³ at the bearing; M = N_w·a + F_lat·r with each member case's design loads.
    // The strength: rock elm at 12 %, 102 MPa mean (Wood Handbook Table 5-3a) × (1 − 1.645 × 0.16),
    // selected stock 0.8, × k_mod / γ_M of the case (EN 1995-1-1 Tables 3.1 and 2.3: short 0.9 / 1.3
    // in the fundamental combination, instantaneous 1.1 / 1.0 in the accidental one, permanent 0.6).
    const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData);
    const W = (78 * 72 * 72) / 6;
    const fk = 102 * (1 - 1.645 * 0.16) * 0.8;
    const kMod = { permanent: 0.6, long: 0.7, medium: 0.8, short: 0.9, instantaneous: 1.1 } as const;
    const worked = a.memberCases.map((c) => {
      const sigma = (c.wheel_N * 350 + c.wheelLateral_N * 470) / W;
      const fd = (fk * kMod[c.duration]) / c.gammaM;
      return { id: c.id, sigma, fd, u: sigma / fd };
    });
    const gov = worked.reduce((w, c) => (c.u > w.u ? c : w));
    expect(stepsOf(f, 'a = (t − s)/2')[0].result).toBe(350);
    expect(f.params.mode).toBe('bending at the bearing');
    expect(f.load_case).toBe(gov.id);
    expect(f.value).toBeCloseTo(gov.sigma, 9);
    expect(f.limit).toBeCloseTo(gov.fd, 9);
    // Every case's three checks are worked: one shear and two bending checks a case.
    expect(stepsOf(f, 'τ = 1.5·N_w/A')).toHaveLength(a.memberCases.length);
    expect(stepsOf(f, 'f_m,d = f_m,k·k_select·k_mod/γ_M').length).toBe(2 * a.memberCases.length);
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
