import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const leather = (raw: unknown) => new Analysis(prepared(raw), rulesData).cutting.leather;
const limits = rulesData.params.cutlist;

describe('leather list by hand', () => {
  const l = leather(readDemo('demo-two-crew'));
  const item = (name: string) => l.items.find((i) => i.item === name)!;

  it('floor straps: count from the pitch, span plus a turn round the rail at each end', () => {
    // Floor 560 deep, 1020 wide, pitch 32; rail 80 × 45: one turn 2 × (80 + 45) = 250 mm.
    const fb = item('floor straps, front-to-back');
    expect(fb.quantity).toBe(31); // floor(1020/32)
    expect(fb.length_mm).toBe(560 + 2 * 250);
    expect(fb.area_m2).toBeCloseTo((31 * 1060 * 30) / 1e6, 12);
    const ss = item('floor straps, side-to-side');
    expect(ss.quantity).toBe(17); // floor(560/32)
    expect(ss.length_mm).toBe(1020 + 2 * 250);
  });

  it('lashings: (wraps + anchor turns at both ends) × the wrap perimeter + two 150 mm tails', () => {
    // Pole 62 × 66 on an axle 78 × 72: one wrap 2 × ((66 + 72) + 78) = 432 mm; 20 wraps + 2 × 2 anchor turns.
    const pa = item('lashing, pole-to-axle');
    expect(pa.length_mm).toBe(24 * 432 + 300);
    expect(pa.area_m2).toBeCloseTo((10668 * 16) / 1e6, 12);
    // Pole on the yoke 56 × 54: 2 × ((66 + 54) + 62) = 364 mm.
    expect(item('lashing, pole-to-yoke').length_mm).toBe(24 * 364 + 300);
  });

  it('hides: total area × waste factor over the usable hide, rounded up', () => {
    const total = l.items.reduce((s, i) => s + i.area_m2, 0);
    expect(l.hides).toHaveLength(1);
    const h = l.hides[0];
    expect(h.material).toBe('rawhide');
    expect(h.area_m2).toBeCloseTo(total, 12);
    // 0.9858 + 0.7752 + 0.170688 + 0.144576 + 0.156096 m² (axle to floor: 24 × 2 × ((72 + 45) + 80) + 300 = 9756 mm × 16).
    expect(total).toBeCloseTo(0.9858 + 0.7752 + 0.170688 + (9036 * 16) / 1e6 + (9756 * 16) / 1e6, 9);
    expect(h.hides).toBe(Math.ceil((total * limits.hide_waste_factor.value) / limits['usable_hide_m2.rawhide'].value));
  });

  it('a tyre per wheel at mid-thickness, and materials counted apart', () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { wheels: { tyre: { material: 'vegetable-tanned-leather', width_mm: 50, thickness_mm: 8 } } });
    const t = leather(raw);
    const tyre = t.items.find((i) => i.item === 'tyre')!;
    expect(tyre.quantity).toBe(2);
    expect(tyre.length_mm).toBeCloseTo(Math.PI * (940 - 8), 9);
    expect(tyre.area_m2).toBeCloseTo((2 * Math.PI * 932 * 50) / 1e6, 12);
    const veg = t.hides.find((h) => h.material === 'vegetable-tanned-leather')!;
    expect(veg.usable_hide_m2).toBe(limits['usable_hide_m2.vegetable-tanned-leather'].value);
    // 0.2928 m² × 1.3 / 2 → 1 side.
    expect(veg.hides).toBe(Math.ceil((tyre.area_m2 * limits.hide_waste_factor.value) / veg.usable_hide_m2));
  });

  it('a larger floor takes a second hide: 1300 × 800 mm, 30 mm straps at 30 mm pitch', () => {
    const t = leather(deepMerge(readDemo('demo-two-crew'), { box: { floor: { depth_mm: 800, width_mm: 1300 } }, floor_straps: { pitch_mm: 30 } }));
    const area = t.items.reduce((s, i) => s + i.area_m2, 0);
    // floor(1300/30) = 43 straps of 800 + 500 mm and floor(800/30) = 26 of 1300 + 500 mm, 30 mm wide, plus the same lashings.
    expect(t.items.find((i) => i.item === 'floor straps, front-to-back')!.quantity).toBe(43);
    expect(area).toBeCloseTo((43 * 1300 * 30 + 26 * 1800 * 30) / 1e6 + 0.170688 + 0.144576 + 0.156096, 9);
    const hides = Math.ceil((area * limits.hide_waste_factor.value) / limits['usable_hide_m2.rawhide'].value);
    expect(hides).toBe(2); // 3.552 m² × 1.3 / 3.5 m² = 1.32 with the shipped figures
    expect(t.hides[0].hides).toBe(hides);
  });
});
