import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const analysis = (raw: unknown) => new Analysis(prepared(raw), rulesData);
const row = (a: Analysis, part: string) => a.cutting.cut_list.find((i) => i.part.startsWith(part))!;
const massOf = (a: Analysis, part: string) => a.mass.parts.find((p) => p.part === part)!.mass_kg;
const limits = rulesData.params.cutlist;

describe('cut list', () => {
  const a = analysis(readDemo('demo-two-crew'));

  it('lists every part the specification implies, with quantities', () => {
    const q = Object.fromEntries(a.cutting.cut_list.map((i) => [i.part, i.quantity]));
    expect(q).toEqual({
      'floor frame front rail, bent, with the sides': 1,
      'floor frame rear rail': 1,
      axle: 1,
      linchpin: 2,
      pole: 1,
      yoke: 1,
      nave: 2,
      spoke: 12, // 2 wheels × 6
      'felloe piece': 4, // 2 wheels × 2
    });
  });

  it('finished masses follow the mass model: axle, pole and the frame as a whole', () => {
    expect(row(a, 'axle').mass_kg).toBeCloseTo(massOf(a, 'axle'), 9);
    expect(row(a, 'pole').mass_kg).toBeCloseTo(massOf(a, 'pole'), 9);
    const frame = a.cutting.cut_list.filter((i) => i.part.startsWith('floor frame')).reduce((s, i) => s + i.quantity * i.mass_kg, 0);
    expect(frame).toBeCloseTo(massOf(a, 'floor frame'), 9);
    // A straight frame too (the rear-axle demo: four halved corners).
    const r = analysis(readDemo('demo-rear-axle'));
    const straight = r.cutting.cut_list.filter((i) => i.part.startsWith('floor frame')).reduce((s, i) => s + i.quantity * i.mass_kg, 0);
    expect(straight).toBeCloseTo(massOf(r, 'floor frame'), 9);
  });

  it('nave volume by hand: π/4 × (160² − 76²) × 340 mm³ at the species density', () => {
    const nave = row(a, 'nave');
    const vol = (Math.PI / 4) * (160 ** 2 - 76 ** 2) * 340 * 1e-9;
    const axle = row(a, 'axle'); // same species, rock elm: density = mass / volume
    const density = axle.mass_kg / (2080 * 78 * 72 * 1e-9);
    expect(nave.mass_kg).toBeCloseTo(vol * density, 9);
    expect(nave.rough).toEqual({ length_mm: 390, width_mm: 166, thickness_mm: 166 });
    expect(nave.volume_m3).toBeCloseTo(390 * 166 * 166 * 1e-9, 12);
  });

  it('straight frame rails run to the outside of the frame (halved corners)', () => {
    const r = analysis(readDemo('demo-rear-axle'));
    // depth 508 ("20 in"), width 980, rail 80: sides 508 + 80 + 80 = 668, front and rear 980 + 80 + 80 = 1140.
    expect(row(r, 'floor frame side').finished.length_mm).toBeCloseTo(668, 9);
    expect(row(r, 'floor frame side').quantity).toBe(2);
    expect(row(r, 'floor frame front').finished.length_mm).toBeCloseTo(1140, 9);
    expect(row(r, 'floor frame rear').finished.length_mm).toBeCloseTo(1140, 9);
    expect(row(r, 'floor frame side').steam_bent).toBe(false);
  });

  it('the bent front rail is one blank: developed centre line, convex face against the strap, form ends', () => {
    const bow = row(a, 'floor frame front rail');
    // a = 560 + 80 = 640, b = 1020 + 80 = 1100, r = 520: sides 2 × (640 − 520 + 40), front 1100 − 1040, arcs π × 520.
    const developed = 2 * 160 + 60 + Math.PI * 520;
    expect(bow.finished.length_mm).toBeCloseTo(developed, 9);
    expect(bow.steam_bent).toBe(true);
    // Against a strap the outer face keeps its length: + 2 × (π/2) × 40; then the bending form's ends.
    const end = limits.bend_end_allowance_mm.value;
    expect(bow.rough.length_mm).toBe(Math.ceil(developed + Math.PI * 40 + 2 * Math.max(end, 25)));
  });

  it('the bent pole: developed length from the layout, convex face h/2 × bend angle longer, spares at the good-bend fraction', () => {
    const pole = row(a, 'pole');
    const path = a.mass.layout.pole.ok ? a.mass.layout.pole.path : undefined;
    expect(pole.finished.length_mm).toBeCloseTo(path!.totalLength, 9);
    const end = limits.bend_end_allowance_mm.value;
    expect(pole.rough.length_mm).toBe(Math.ceil(path!.totalLength + 33 * path!.bendAngle + 2 * end));
    expect(pole.rough).toMatchObject({ width_mm: 68, thickness_mm: 72 });
    const good = limits.bend_good_fraction.value;
    expect(pole.spares).toBe(Math.ceil(1 / good) - 1);
    expect(row(a, 'felloe piece').spares).toBe(Math.ceil(4 / good) - 4);
    expect(row(a, 'axle').spares).toBe(0);
  });

  it('without a strap the blank is the centre line', () => {
    const b = analysis(deepMerge(readDemo('demo-two-crew'), { pole: { bend_strap: false }, wheels: { felloe: { bend_strap: false } } }));
    const path = b.mass.layout.pole.ok ? b.mass.layout.pole.path : undefined;
    const end = limits.bend_end_allowance_mm.value;
    expect(row(b, 'pole').rough.length_mm).toBe(Math.ceil(path!.totalLength + 2 * end));
    // Felloe: mid-depth arc 2π × 447 / 2 instead of the outer face's 2π × 470 / 2.
    expect(row(b, 'felloe piece').rough.length_mm).toBe(Math.ceil(Math.PI * 447 + 2 * end));
    expect(row(a, 'felloe piece').rough.length_mm).toBe(Math.ceil(Math.PI * 470 + 2 * end));
  });

  it('sawn felloe segments come from a plank that holds the curve', () => {
    // Teaching example: Ø860, felloe 40 deep, 38 wide, 4 sawn pieces: R_o = 430, R_i = 390.
    const f = row(analysis(readDemo('teaching-flawed')), 'felloe piece');
    expect(f.quantity).toBe(8);
    expect(f.steam_bent).toBe(false);
    // Chord 2 × 430 × sin 45° = 608.1 + 50; width 430 − 390 cos 45° = 154.2 + 6; thickness 38 + 6.
    expect(f.rough).toEqual({ length_mm: Math.ceil(2 * 430 * Math.SQRT1_2 + 50), width_mm: Math.ceil(430 - 390 * Math.SQRT1_2 + 6), thickness_mm: 44 });
    expect(f.grain).toContain('grain along the chord');
  });

  it('spokes: overall length with both tenons; linchpins from the axle', () => {
    const so = a.cutting.setting_out;
    expect(row(a, 'spoke').finished.length_mm).toBeCloseTo(so.spoke_length_overall_mm, 9);
    const pin = row(a, 'linchpin');
    // Axle 78 × 72: diameter fraction × 72, length factor × 72.
    expect(pin.finished.width_mm).toBeCloseTo(limits.linchpin_diameter_fraction.value * 72, 9);
    expect(pin.finished.length_mm).toBeCloseTo(limits.linchpin_length_factor.value * 72, 9);
    expect(pin.species).toBe('rock-elm');
  });

  it('grain from the grade: selected stock riven or clear, sawn stock sawn', () => {
    expect(row(a, 'axle').grain).toBe('straight grain, riven or clear (selected)');
    expect(row(analysis(deepMerge(readDemo('demo-two-crew'), { stock: { grade: 'sawn' } })), 'axle').grain).toBe('straight grain, sawn');
    expect(row(a, 'pole').grain).toContain('free of knots and run-out');
  });

  it('lists extra parts, and refuses one of an unknown species', () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { extra_parts: [{ name: 'hand rail', species: 'white-ash', length_mm: 900, width_mm: 30, thickness_mm: 30, quantity: 2 }] } });
    const rail = row(analysis(raw), 'hand rail');
    expect(rail.quantity).toBe(2);
    expect(rail.rough).toEqual({ length_mm: 950, width_mm: 36, thickness_mm: 36 });
    const bad = prepareSpec(deepMerge(raw, { stock: { extra_parts: [{ name: 'x', species: 'teak', length_mm: 100, width_mm: 10, thickness_mm: 10 }] } }), rulesData);
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues.map((i) => i.path.join('.'))).toContain('stock.extra_parts.0.species');
  });
});
