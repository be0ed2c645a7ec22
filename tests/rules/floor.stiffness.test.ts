import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { formatQuantity } from '../../src/core/format/number-format.ts';
import { G } from '../../src/core/units/units.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'floor.stiffness';

describe(RULE, () => {
  it('notes the secant and tangent stiffness under each crew member standing', async () => {
    for (const demo of ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed']) {
      const r = readDemo(demo);
      const found = await findingsOf(RULE, r);
      const m = new Analysis(prepared(r), rulesData).floorStatic;
      expect(found.map((f) => f.severity)).toEqual(m.crew.map(() => 'info'));
      found.forEach((f, i) => {
        const c = m.crew[i];
        expect(f).toMatchObject({ subject: `crew.${i}`, subject_label: `${c.role}, standing`, message_key: 'note', code: 2231, load_case: 'static', unit: 'N/mm' });
        expect(f.value).toBe(c.secantStiffness_N_per_mm);
        // The demo's driver weighs 78 kg: P = 78 × 9.80665 N standing.
        if (demo === 'demo-two-crew' && i === 0) expect(c.load_N).toBeCloseTo(78 * G, 9);
        // Secant stiffness by its definition, load over sag (design basis, section 5).
        expect(f.value).toBeCloseTo(c.load_N / c.sag_mm, 12);
        expect(f.params).toMatchObject({ role: c.role, load: c.load_N, sag: c.sag_mm, tangent: c.tangentStiffness_N_per_mm });
        expect(f.message).toContain(`tangent stiffness ${formatQuantity(c.tangentStiffness_N_per_mm, 'N/mm')}`);
        expect(f.working.find((s) => s.formula === 'k_s = P / sag')!.result).toBe(c.secantStiffness_N_per_mm);
        // A cable net stiffens as it sags: the tangent is above the secant.
        expect(c.tangentStiffness_N_per_mm).toBeGreaterThan(c.secantStiffness_N_per_mm);
      });
    }
  });

  it('a stiffer floor (thicker straps) is stiffer under the same person', async () => {
    // 24 mm rawhide straps at 34 mm pitch and 160 N, 4 mm thick against 8 mm (demo data).
    const straps = (thickness_mm: number) => deepMerge(readDemo('demo-two-crew'), { floor_straps: { width_mm: 24, thickness_mm, pitch_mm: 34, pretension_N: 160 } });
    const thin = (await findingsOf(RULE, straps(4)))[0].value!;
    const thick = (await findingsOf(RULE, straps(8)))[0].value!;
    expect(thick).toBeGreaterThan(thin);
  });

  it('says so, as information, when the floor was not solved', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { floor_straps: { width_mm: 5, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.map((f) => [f.severity, f.code, f.message_key, f.subject])).toEqual([['info', 2232, 'notSolved', 'floor.net']]);
    expect(found[0].message).toContain('max_nodes');
  });
});
