import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { greenSize, shrinkageTo } from '../../src/core/cutlist/shrinkage.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

// Wood Handbook (USDA FPL, FPL-GTR-190, 2010), chapter 4, the equation for
// shrinkage from green to a moisture content M below fibre saturation:
// S_M = S_0 (30 − M)/30; a part that must measure d at M is cut green at
// d / (1 − S_M/100) (mechanics note, section 1). S_0 from Table 4-3.

const ash = rulesData.species['white-ash'].shrinkage_pct;

describe('green sizing by the Wood Handbook shrinkage relation', () => {
  it('white ash, tangential, to 12 %: S_12 = 7.8 × 18/30 = 4.68 %', () => {
    expect(ash.tangential.value).toBe(7.8); // Table 4-3
    expect(shrinkageTo(7.8, 12)).toBeCloseTo(4.68, 12);
    // Hand calculation: 50 mm at 12 % is cut green at 50 / 0.9532 = 52.4549 mm.
    expect(greenSize(50, 7.8, 12)).toBeCloseTo(52.4549, 4);
  });

  it('white ash, radial, to 15 %: S_15 = 4.9 × 15/30 = 2.45 %', () => {
    expect(shrinkageTo(4.9, 15)).toBeCloseTo(2.45, 12);
    expect(greenSize(100, 4.9, 15)).toBeCloseTo(100 / 0.9755, 9);
  });

  it('no shrinkage at or above fibre saturation (30 %), the whole S_0 at oven-dry', () => {
    expect(shrinkageTo(7.8, 30)).toBe(0);
    expect(shrinkageTo(7.8, 45)).toBe(0);
    expect(shrinkageTo(7.8, 0)).toBeCloseTo(7.8, 12);
  });

  it('the cut list sizes green spokes up by the tangential figure where the orientation is unknown', () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { green: true } });
    const spoke = new Analysis(prepared(raw), rulesData).cutting.cut_list.find((i) => i.part === 'spoke')!;
    // White ash spoke 36 × 30 at 12 %, 3 mm a face: (36 + 6)/(1 − 0.0468) = 44.06 → 45; (30 + 6)/0.9532 = 37.77 → 38.
    expect(spoke.rough.width_mm).toBe(45);
    expect(spoke.rough.thickness_mm).toBe(38);
    // Length is not sized for shrinkage (longitudinal 0.1 to 0.2 %, Wood Handbook chapter 4): 418.14 + 2 × 25 → 469.
    expect(spoke.rough.length_mm).toBe(469);
  });

  it('flat-sawn: the width tangential, the thickness radial; quarter-sawn the other way round', () => {
    const base = readDemo('demo-two-crew');
    const spoke = (orientation: string) => new Analysis(prepared(deepMerge(base, { stock: { green: true, orientation } })), rulesData).cutting.cut_list.find((i) => i.part === 'spoke')!;
    // Radial S_12 = 4.9 × 18/30 = 2.94 %: (30 + 6)/0.9706 = 37.09 → 38; (36 + 6)/0.9706 = 43.27 → 44.
    expect(spoke('flat-sawn').rough).toMatchObject({ width_mm: 45, thickness_mm: 38 });
    expect(spoke('quarter-sawn').rough).toMatchObject({ width_mm: 44, thickness_mm: 38 });
    const axle = new Analysis(prepared(deepMerge(base, { stock: { green: true, orientation: 'flat-sawn' } })), rulesData).cutting.cut_list.find((i) => i.part === 'axle')!;
    // Rock elm (Table 4-3: radial 4.8, tangential 8.1) 78 × 72: (78 + 6)/(1 − 0.0486) = 88.29 → 89; (72 + 6)/(1 − 0.0288) = 80.31 → 81.
    expect(axle.rough).toMatchObject({ width_mm: 89, thickness_mm: 81 });
  });

  it('turned parts take the tangential figure across both, whatever the orientation', () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { green: true, orientation: 'quarter-sawn' } });
    const nave = new Analysis(prepared(raw), rulesData).cutting.cut_list.find((i) => i.part === 'nave')!;
    // Rock elm nave Ø160: (160 + 6)/(1 − 8.1 × 18/30/100) = 166/0.9514 = 174.48 → 175.
    expect(nave.rough).toMatchObject({ width_mm: 175, thickness_mm: 175 });
  });

  it('dry stock gets the machining allowances alone', () => {
    const axle = new Analysis(prepared(readDemo('demo-two-crew')), rulesData).cutting.cut_list.find((i) => i.part === 'axle')!;
    // 2080 × 78 × 72 with 25 mm an end and 3 mm a face (the demo's stock.allowance).
    expect(axle.rough).toEqual({ length_mm: 2130, width_mm: 84, thickness_mm: 78 });
  });
});
