import { describe, expect, it } from 'vitest';
import { rectangle, round } from '../src/core/model/sections.ts';
import { speciesDensity } from '../src/core/model/species-density.ts';
import { axleSection, frameSectionInPlan } from '../src/core/model/spec-sections.ts';
import { MESSAGES } from '../src/core/diagnostics/messages.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { Analysis } from './support/analysis.ts';
import { findingsOf, prepared, readDemo, rulesData } from './support/fixtures.ts';
import { stepsOf } from './support/member-support.ts';

// Round floor-frame bars and a round axle (bent round rods, as in New Kingdom
// Egyptian bodies): the section, the stack under the floor, the masses, the
// cut list and the member rules, against closed forms worked by hand.

type Raw = Record<string, any>;

/** The central-axle demo with the frame rails and the axle given as diameters instead of two sizes. */
function roundDemo(frameD: number, axleD: number): Raw {
  const raw = structuredClone(readDemo('demo-two-crew')) as Raw;
  delete raw.box.floor.frame.width_mm;
  delete raw.box.floor.frame.thickness_mm;
  raw.box.floor.frame.diameter_mm = frameD;
  delete raw.axle.width_mm;
  delete raw.axle.height_mm;
  raw.axle.diameter_mm = axleD;
  return raw;
}

const issuesOf = (raw: unknown) => {
  const p = prepareSpec(raw, rulesData);
  return p.ok ? [] : p.issues.map((i) => ({ path: i.path.join('.'), code: i.code, message: i.message }));
};

describe('round section', () => {
  it('a 40 mm round: I = π d⁴/64, W = π d³/32, A = π d²/4 (any handbook table of plane sections)', () => {
    const s = round(40);
    // By hand: 40⁴ = 2 560 000, × π / 64 = 125 663.7 mm⁴; 40³ = 64 000, × π / 32 = 6283.19 mm³; π × 1600 / 4 = 1256.64 mm².
    expect(s.I).toBeCloseTo(125663.706, 3);
    expect(s.W).toBeCloseTo(6283.185, 3);
    expect(s.area).toBeCloseTo(1256.637, 3);
    expect(s.W).toBeCloseTo(s.I / 20, 9); // W = I / (d/2)
    expect(s.Imin).toBe(s.I);
    expect(s.shearFactor).toBeCloseTo(4 / 3, 12); // peak shear of a solid circle, 4V/3A
    expect(s.formulas.W).toEqual(['π·d³/32', 'π × 40³/32']);
  });

  it('a rectangle keeps W = b h²/6 and its working', () => {
    const s = rectangle(78, 72);
    expect(s.W).toBe((78 * 72 * 72) / 6);
    expect(s.formulas.W).toEqual(['b·h²/6', '78 × 72²/6']);
    expect(s.formulas.shearFactor).toBe('1.5');
  });

  it('the spec helpers give the frame bent in plan and the axle in the vertical plane, for either form', () => {
    const rect = prepared(readDemo('demo-two-crew'));
    // Demo frame 80 wide in plan, 45 thick: bent in plan W = 45 × 80²/6; axle 78 × 72: W = 78 × 72²/6.
    expect(frameSectionInPlan(rect).W).toBe((45 * 80 * 80) / 6);
    expect(axleSection(rect).W).toBe((78 * 72 * 72) / 6);
    const rnd = prepared(roundDemo(45, 75));
    expect(frameSectionInPlan(rnd).W).toBeCloseTo((Math.PI * 45 ** 3) / 32, 9);
    expect(axleSection(rnd).W).toBeCloseTo((Math.PI * 75 ** 3) / 32, 9);
  });
});

describe('a round frame and a round axle through the models', () => {
  const raw = roundDemo(45, 75);
  const a = new Analysis(prepared(raw), rulesData, undefined, { ride: false });

  it('stack under the floor: wheel radius + half the axle diameter + pole height + frame diameter', () => {
    // 940/2 + 75/2 + 66 + 45 = 618.5 mm (demo: wheel 940, pole 66 high).
    expect(a.spec.box.floor.height_mm).toBe(618.5);
    expect(a.mass.layout.frameZ).toBe(618.5 - 45 / 2);
  });

  it('masses: rail length × π d²/4 and axle length × π D²/4, times the density at 12 %', () => {
    const rho = (s: string) => speciesDensity(rulesData, s, 12);
    // Rail centre lines: a = 560 + 45, b = 1020 + 45; the two bent front corners of radius 520 take (4 − π) × 520 off 2 (a + b).
    const rail = 2 * (605 + 1065) - (4 - Math.PI) * 520;
    const frame = a.mass.parts.find((p) => p.part === 'floor frame')!;
    expect(frame.mass_kg).toBeCloseTo(rail * ((Math.PI * 45 ** 2) / 4) * 1e-9 * rho('white-ash'), 9);
    expect(frame.basis).toMatch(/round bar × π\/4 × 45²/);
    const axle = a.mass.parts.find((p) => p.part === 'axle')!;
    expect(axle.mass_kg).toBeCloseTo(2080 * ((Math.PI * 75 ** 2) / 4) * 1e-9 * rho('rock-elm'), 9);
  });

  it('the floor straps wrap the round rail by its circumference π d', () => {
    const rectA = new Analysis(prepared(readDemo('demo-two-crew')), rulesData, undefined, { ride: false });
    const straps = (x: Analysis) => x.cutting.leather.items.find((i) => i.item === 'floor straps, front-to-back')!;
    // One turn round each end: 2 (80 + 45) = 250 mm for the rectangle, π × 45 = 141.4 mm for the round bar.
    expect(straps(rectA).length_mm - straps(a).length_mm).toBeCloseTo(2 * (250 - Math.PI * 45), 9);
  });

  it('the cut list names round bars by their diameter and weighs them as the mass model does', () => {
    const rows = a.cutting.cut_list;
    const bow = rows.find((r) => r.part === 'floor frame front rail, bent, with the sides, round bar 45 mm diameter')!;
    const rear = rows.find((r) => r.part === 'floor frame rear rail, round bar 45 mm diameter')!;
    expect(bow.finished.width_mm).toBe(45);
    expect(bow.finished.thickness_mm).toBe(45);
    expect(bow.basis).toMatch(/turned or shaved round from a square billet 45 mm/);
    const frame = a.mass.parts.find((p) => p.part === 'floor frame')!;
    // The halvings take out the overlap of the centre-line rectangle: the rails weigh what the frame does.
    expect(bow.mass_kg + rear.mass_kg).toBeCloseTo(frame.mass_kg, 9);
    const axle = rows.find((r) => r.part === 'axle, round bar 75 mm diameter')!;
    expect(axle.mass_kg).toBeCloseTo(a.mass.parts.find((p) => p.part === 'axle')!.mass_kg, 9);
    expect(axle.basis).toMatch(/round, π\/4 × 75² × 2080 mm/);
    // The linchpin is sized from the round axle's diameter.
    expect(rows.find((r) => r.part === 'linchpin')!.basis).toMatch(/smaller side 75 mm/);
  });

  it('member.frame-rail bends the round rail with W = π d³/32', async () => {
    const [f] = await findingsOf('member.frame-rail', raw);
    const w = stepsOf(f, 'W = π·d³/32');
    expect(w).toHaveLength(1);
    expect(w[0].result).toBeCloseTo((Math.PI * 45 ** 3) / 32, 6);
  });

  it('member.axle bends and shears the round axle at the bearing', async () => {
    const [f] = await findingsOf('member.axle', raw);
    expect(stepsOf(f, 'W_bearing = π·d³/32')[0].result).toBeCloseTo((Math.PI * 75 ** 3) / 32, 6);
    expect(stepsOf(f, 'A = π·d²/4')[0].result).toBeCloseTo((Math.PI * 75 ** 2) / 4, 6);
    // Peak shear of a solid circle: 4/3 of the mean, in every case.
    expect(stepsOf(f, 'τ = 4/3·N_w/A').length).toBeGreaterThan(0);
  });
});

describe('one form of section, no more and no less', () => {
  it('refuses a frame given a diameter and rectangular sizes', () => {
    const raw = roundDemo(45, 75);
    raw.box.floor.frame.width_mm = 80;
    expect(issuesOf(raw)).toEqual([
      { path: 'box.floor.frame.diameter_mm', code: 1150, message: 'both forms of the section are given (diameter_mm and width_mm and thickness_mm); give one: diameter_mm alone for a round bar, or width_mm and thickness_mm for a rectangular one.' },
    ]);
  });

  it('refuses an axle with neither form, and one with half a rectangle', () => {
    const none = roundDemo(45, 75);
    delete none.axle.diameter_mm;
    expect(issuesOf(none)).toEqual([{ path: 'axle', code: 1151, message: 'the section is not given; give width_mm and height_mm for a rectangular bar, or diameter_mm alone for a round one.' }]);
    const half = roundDemo(45, 75);
    delete half.axle.diameter_mm;
    half.axle.width_mm = 78;
    expect(issuesOf(half)).toEqual([{ path: 'axle.height_mm', code: 1152, message: 'width_mm is given without height_mm: a rectangular section needs both (or give diameter_mm alone for a round bar).' }]);
  });

  it('every message of the one table has a code of its own', () => {
    const codes = Object.values(MESSAGES).map((m) => m.code);
    expect(codes.filter((c, i) => codes.indexOf(c) !== i)).toEqual([]);
    expect(codes.filter((c) => c >= 1150 && c < 1160)).toHaveLength(7);
  });

  it('accepts either form alone', () => {
    expect(issuesOf(readDemo('demo-two-crew'))).toEqual([]);
    expect(issuesOf(roundDemo(45, 75))).toEqual([]);
  });
});
