import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const settingOut = (raw: unknown) => new Analysis(prepared(raw), rulesData).cutting.setting_out;
const tenon = rulesData.params.cutlist;

describe('wheel setting-out against hand calculation', () => {
  it('the central-axle demo: 6 spokes, 2 bent felloe pieces, no tyre', () => {
    const so = settingOut(readDemo('demo-two-crew'));
    // Ø940, felloe depth 46: R_i = 470 − 46 = 424; nave Ø160: r_n = 80; between shoulders 424 − 80 = 344.
    expect(so.spoke_length_shoulders_mm).toBeCloseTo(344, 9);
    // Tenons: nave wall (160 − 76)/2 = 42 × the rules' fraction; through the felloe, depth 46 × its fraction.
    expect(so.tenon_nave_mm).toBeCloseTo(tenon.nave_tenon_fraction.value * 42, 9);
    expect(so.tenon_felloe_mm).toBeCloseTo(tenon.felloe_tenon_fraction.value * 46, 9);
    expect(so.spoke_length_overall_mm).toBeCloseTo(344 + so.tenon_nave_mm + so.tenon_felloe_mm, 9);
    // Mortises every 360/6 = 60°.
    expect(so.mortise_spacing_deg).toBe(60);
    expect(so.mortise_positions_deg).toEqual([0, 60, 120, 180, 240, 300]);
    // Felloe piece on the outer face R = 470: arc 2π × 470/2 = 1476.549; chord 2 × 470 × sin(π/2) = 940.
    expect(so.felloe_pieces).toBe(2);
    expect(so.felloe_arc_mm).toBeCloseTo(1476.549, 3);
    expect(so.felloe_chord_mm).toBeCloseTo(940, 9);
    // Radial end faces of a half ring lie along its chord: 90° − 180°/2 = 0°.
    expect(so.felloe_end_angle_deg).toBeCloseTo(0, 12);
    // Joints midway between spokes: 30° and 210°.
    expect(so.dowel_positions_deg).toEqual([30, 210]);
    expect(so.tyre_length_mm).toBeNull();
  });

  it('5 spokes, 3 pieces and a 10 mm tyre: chord, end angle, joints off the spokes, tyre length', () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { wheels: { spokes: 5, felloe: { pieces: 3, bend_radius_mm: 414 }, tyre: { material: 'rawhide', width_mm: 40, thickness_mm: 10 } } });
    const so = settingOut(raw);
    // R_o = 470 − 10 = 460; R_i = 460 − 46 = 414; shoulders 414 − 80 = 334.
    expect(so.spoke_length_shoulders_mm).toBeCloseTo(334, 9);
    expect(so.mortise_spacing_deg).toBe(72);
    // Arc 2π × 460/3 = 963.422; chord 2 × 460 × sin(60°) = 796.743; end faces 90° − 60° = 30° to the chord.
    expect(so.felloe_arc_mm).toBeCloseTo(963.422, 3);
    expect(so.felloe_chord_mm).toBeCloseTo(796.743, 3);
    expect(so.felloe_end_angle_deg).toBeCloseTo(30, 12);
    // Tyre at mid-thickness: π × (940 − 10) = 2921.681.
    expect(so.tyre_length_mm).toBeCloseTo(2921.681, 3);
    // lcm(5, 3) = 15: joints 12° off, every 120°.
    expect(so.dowel_positions_deg.map((a) => Number(a.toFixed(9)))).toEqual([12, 132, 252]);
  });

  it('no placement of the joints keeps them further from every spoke (brute force over 0.05° steps)', () => {
    const clearance = (joints: number[], spokes: number[]) =>
      Math.min(...joints.flatMap((j) => spokes.map((s) => { const d = Math.abs(((j - s) % 360) + 360) % 360; return Math.min(d, 360 - d); })));
    for (const [n, p] of [[5, 3], [6, 2], [8, 3], [7, 2], [12, 6]]) {
      const raw = deepMerge(readDemo('demo-two-crew'), { wheels: { spokes: n, felloe: { pieces: p } } });
      const so = settingOut(raw);
      const got = clearance(so.dowel_positions_deg, so.mortise_positions_deg);
      let best = 0;
      for (let k = 0; k < 7200; k++) best = Math.max(best, clearance(Array.from({ length: p }, (_, j) => k / 20 + (360 * j) / p), so.mortise_positions_deg));
      expect(got, `${n} spokes, ${p} pieces`).toBeGreaterThanOrEqual(best - 1e-9);
    }
  });

  it('one-piece felloe: one joint, no chord', () => {
    const so = settingOut(deepMerge(readDemo('demo-two-crew'), { wheels: { felloe: { pieces: 1 } } }));
    expect(so.felloe_arc_mm).toBeCloseTo(2 * Math.PI * 470, 9);
    expect(so.felloe_chord_mm).toBe(0);
    expect(so.dowel_positions_deg).toHaveLength(1);
  });
});
