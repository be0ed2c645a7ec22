import { describe, expect, it } from 'vitest';
import { tyreOf, wheelBuild } from '../src/core/model/tyre.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { Analysis } from './support/analysis.ts';
import { deepMerge, prepared, readDemo, rulesData } from './support/fixtures.ts';

// The tyre's kinds: none (a bare felloe), rawhide (a hide or leather band,
// named by its material) and iron (a forged band weighed at the density of
// steel). Demo wheel: 940 mm across, felloe 42 mm wide (demo data).

const withTyre = (tyre: unknown) => deepMerge(readDemo('demo-two-crew'), { wheels: { tyre } });
const analysis = (raw: unknown) => new Analysis(prepared(raw), rulesData, undefined, { ride: false });
const wheelMass = (a: Analysis) => a.mass.parts.find((p) => p.part === 'wheel, left')!.mass_kg;
const issuesOf = (raw: unknown) => {
  const p = prepareSpec(raw, rulesData);
  return p.ok ? [] : p.issues.map((i) => ({ path: i.path.join('.'), code: i.code }));
};

describe('tyre kinds', () => {
  it('kind none is a bare felloe, as no tyre key is', () => {
    const none = analysis(withTyre({ kind: 'none' }));
    const bare = analysis(readDemo('demo-two-crew'));
    expect(tyreOf(none.spec)).toBeNull();
    expect(none.mass.layout.felloeOuter).toBe(470);
    expect(wheelMass(none)).toBe(wheelMass(bare));
    expect(none.cutting.setting_out.tyre_length_mm).toBeNull();
    expect(wheelBuild(none.spec)).toBe('bare');
  });

  it('a tyre given in the older form, without a kind, is a hide tyre', () => {
    const a = analysis(withTyre({ material: 'rawhide', width_mm: 40, thickness_mm: 8 }));
    expect(tyreOf(a.spec)).toEqual({ kind: 'rawhide', material: 'rawhide', width: 40, thickness: 8 });
    expect(wheelBuild(a.spec)).toBe('tyred');
  });

  it('an iron tyre weighs its ring at 7850 kg/m³: π (R² − R_o²) × width', () => {
    const size = { width_mm: 40, thickness_mm: 8 };
    const iron = analysis(withTyre({ kind: 'iron', ...size, pre_compression_N: 500 }));
    const hide = analysis(withTyre({ kind: 'rawhide', material: 'rawhide', ...size }));
    // Same ring both ways: R = 470, R_o = 462 mm; by hand 470² − 462² = 8 × 932 = 7456 mm², × 40 × π = 936 949 mm³.
    const ring = Math.PI * (470 ** 2 - 462 ** 2) * 40 * 1e-9;
    expect(ring).toBeCloseTo(0.000936949, 9);
    expect(iron.mass.layout.felloeOuter).toBe(462);
    // The two wheels differ only by the ring's density: iron 7850 (EN 1993-1-1, 3.2.6), rawhide as the leathers file holds it.
    const rawhide = rulesData.leathers.rawhide.density_kg_per_m3.value;
    expect(wheelMass(iron) - wheelMass(hide)).toBeCloseTo(ring * (7850 - rawhide), 9);
    expect(iron.mass.parts.find((p) => p.part === 'wheel, left')!.basis).toMatch(/iron tyre π × \(470² − 462²\) × 40 mm/);
    expect(tyreOf(iron.spec)).toMatchObject({ kind: 'iron', preCompression: 500 });
  });

  it("an iron tyre is the smith's: no hide in the leather list, its length in the setting-out, the bare wheel's stiffness in the ride model", () => {
    const iron = analysis(withTyre({ kind: 'iron', width_mm: 40, thickness_mm: 8 }));
    expect(iron.cutting.leather.items.some((i) => i.item === 'tyre')).toBe(false);
    expect(iron.cutting.setting_out.tyre_length_mm).toBeCloseTo(Math.PI * (940 - 8), 9);
    expect(iron.cutting.setting_out.basis.join('\n')).toMatch(/iron tyre: its mid-thickness circumference/);
    expect(wheelBuild(iron.spec)).toBe('bare');
  });

  it('refuses a tyre whose keys do not fit its kind', () => {
    expect(issuesOf(withTyre({ kind: 'rawhide', width_mm: 40, thickness_mm: 8 }))).toEqual([{ path: 'wheels.tyre.material', code: 1153 }]);
    expect(issuesOf(withTyre({ kind: 'iron', material: 'rawhide', width_mm: 40, thickness_mm: 8 }))).toEqual([{ path: 'wheels.tyre.material', code: 1154 }]);
    expect(issuesOf(withTyre({ kind: 'iron', thickness_mm: 8 }))).toEqual([{ path: 'wheels.tyre.width_mm', code: 1155 }]);
    expect(issuesOf(withTyre({ kind: 'none', width_mm: 40 }))).toEqual([{ path: 'wheels.tyre.width_mm', code: 1156 }]);
    expect(issuesOf(withTyre({ kind: 'steel', width_mm: 40, thickness_mm: 8 }))).toEqual([{ path: 'wheels.tyre.kind', code: 1034 }]);
  });
});
