import { describe, expect, it } from 'vitest';
import { Analysis } from '../../src/core/engine/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectUtilisationBoundary } from '../support/limit-boundary.ts';

const RULE = 'member.axle';
const one = async (raw: unknown) => (await findingsOf(RULE, raw))[0];

describe(RULE, () => {
  it('passes for the central-axle demo, governed by the worse of the design turn and the bump', async () => {
    const f = await one(readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.working_text).toContain('k_mod');
    // Hand calculation (mechanics note, section 6): a = (1640 − 940)/2 = 350 mm, r = 470 mm,
    // W = 78 × 72²/6 mm³ at the bearing; the outer wheel's loads from the turn model, the bump's from the ride model's wheel factor.
    const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData);
    const bump = a.memberCases.find((c) => c.id === 'bump')!;
    const M = Math.max(a.turn.outerWheel * 350 + a.turn.outerLateral * 470, bump.wheel_N * 350);
    expect(f.subject).toBe('axle, bending at the bearing');
    expect(f.value).toBeCloseTo(M / ((78 * 72 * 72) / 6), 9);
  });

  it('fails an axle cut down to 40 mm, at the arm inside the nave', async () => {
    const f = await one(deepMerge(readDemo('demo-two-crew'), { axle: { width_mm: 40, height_mm: 40 }, wheels: { nave: { bore_mm: 40 } } }));
    expect(f.severity).toBe('fail');
    expect(f.subject).toMatch(/^axle, bending at the (nave|bearing)$/);
    expect(f.utilisation!).toBeGreaterThan(1);
  });

  it('a selected axle is stronger than a sawn one by k_select 0.8 / 0.6', async () => {
    // The axle's own grade, set both ways, so the stock grade of the demo does not matter.
    const raw = readDemo('demo-two-crew');
    const sawn = await one(deepMerge(raw, { axle: { grade: 'sawn' } }));
    const selected = await one(deepMerge(raw, { axle: { grade: 'selected' } }));
    expect(selected.limit! / sawn.limit!).toBeCloseTo(0.8 / 0.6, 12);
    expect(selected.value).toBe(sawn.value);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('demo-rear-axle'), (f) => f[0]);
  });
});
