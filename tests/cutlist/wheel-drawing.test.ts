import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { wheelDrawing } from '../../src/render/drawings/wheel-drawing.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

// The drawing's key dimensions measured back from the SVG text: the sheet's
// user unit is a millimetre of paper and data-scale gives 1:n.

const attr = (tag: string, name: string) => Number(new RegExp(`\\b${name}="([^"]+)"`).exec(tag)![1]);
const tags = (svg: string, cls: string) => [...svg.matchAll(new RegExp(`<[a-z]+ class="${cls}"[^>]*>`, 'g'))].map((m) => m[0]);
const length = (tag: string) => Math.hypot(attr(tag, 'x2') - attr(tag, 'x1'), attr(tag, 'y2') - attr(tag, 'y1'));
const dim = (svg: string, name: string) => tags(svg, 'dim').find((t) => t.includes(`data-dim="${name}"`))!;

function drawing(raw: unknown) {
  const so = new Analysis(prepared(raw), rulesData).cutting.setting_out;
  const svg = wheelDrawing(so.geometry);
  const scale = Number(/data-scale="([\d.]+)"/.exec(svg)![1]);
  return { so, svg, scale };
}

describe('wheel drawing', () => {
  const { so, svg, scale } = drawing(readDemo('demo-two-crew'));

  it('is an A4 sheet drawn at a common scale, the wheel circle to that scale', () => {
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="210mm" height="297mm" viewBox="0 0 210 297"/);
    expect(scale).toBe(10); // 940 mm does not fit 140 mm at 1:5; at 1:10 it is 94 mm
    const tread = tags(svg, 'tread')[0];
    expect(attr(tread, 'r') * scale).toBeCloseTo(470, 2);
    expect(attr(tags(svg, 'felloe-inner')[0], 'r') * scale).toBeCloseTo(424, 2);
    expect(attr(tags(svg, 'nave')[0], 'r') * scale).toBeCloseTo(80, 2);
  });

  it('spoke centre lines measure the length between shoulders, at the mortise angles', () => {
    const spokes = tags(svg, 'spoke-centre');
    expect(spokes).toHaveLength(6);
    for (const s of spokes) expect(length(s) * scale).toBeCloseTo(so.spoke_length_shoulders_mm, 1);
    expect(spokes.map((s) => attr(s, 'data-angle'))).toEqual(so.mortise_positions_deg);
    // Spoke 2's centre line points 60° clockwise from the top.
    const s2 = spokes[1];
    expect((Math.atan2(attr(s2, 'x2') - attr(s2, 'x1'), attr(s2, 'y1') - attr(s2, 'y2')) * 180) / Math.PI).toBeCloseTo(60, 2); // coordinates are written to 0.001 mm
  });

  it('dimension lines measure what their labels and data-value say', () => {
    const d = dim(svg, 'diameter');
    expect(length(d) * scale).toBeCloseTo(940, 2);
    expect(attr(d, 'data-value')).toBe(940);
    expect(svg).toContain('>Ø 940<');
    expect(length(dim(svg, 'spoke-shoulders')) * scale).toBeCloseTo(344, 2);
    expect(length(dim(svg, 'spoke-overall')) * scale).toBeCloseTo(so.spoke_length_overall_mm, 2);
    expect(attr(dim(svg, 'mortise-angle'), 'data-value')).toBe(60);
    const chord = tags(svg, 'chord')[0];
    expect(length(chord) * scale).toBeCloseTo(so.felloe_chord_mm, 2);
    expect(attr(chord, 'data-value')).toBeCloseTo(so.felloe_chord_mm, 3);
    expect(attr(dim(svg, 'felloe-arc'), 'data-value')).toBeCloseTo(so.felloe_arc_mm, 3);
    expect(svg).toContain(`>arc ${Math.round(so.felloe_arc_mm)} (outer face)<`);
  });

  it('the spoke detail is drawn at its own scale and chains to the overall length', () => {
    const g = /<g class="spoke-detail" data-scale="([\d.]+)">/.exec(svg)!;
    const ds = Number(g[1]);
    const parts = ['detail-tenon-nave', 'detail-shoulders', 'detail-tenon-felloe'].map((n) => length(dim(svg, n)) * ds);
    expect(parts[1]).toBeCloseTo(344, 2);
    expect(parts.reduce((a, b) => a + b, 0)).toBeCloseTo(length(dim(svg, 'detail-overall')) * ds, 6);
    expect(length(dim(svg, 'detail-overall')) * ds).toBeCloseTo(so.spoke_length_overall_mm, 2);
  });

  it('felloe joints are drawn at the dowel positions, one per piece', () => {
    const joints = tags(svg, 'felloe-joint');
    expect(joints.map((j) => attr(j, 'data-angle'))).toEqual(so.dowel_positions_deg);
  });

  it('everything stays on the sheet, for small and large wheels', () => {
    for (const raw of [readDemo('demo-two-crew'), deepMerge(readDemo('demo-two-crew'), { wheels: { diameter_mm: 1400, spokes: 12, felloe: { pieces: 6, bend_radius_mm: undefined } } })]) {
      const { svg: s } = drawing(raw);
      for (const m of s.matchAll(/\b(x|x1|x2|cx)="([-\d.]+)"/g)) {
        expect(Number(m[2]), m[0]).toBeGreaterThanOrEqual(0);
        expect(Number(m[2]), m[0]).toBeLessThanOrEqual(210);
      }
      for (const m of s.matchAll(/\b(y|y1|y2|cy)="([-\d.]+)"/g)) {
        expect(Number(m[2]), m[0]).toBeGreaterThanOrEqual(0);
        expect(Number(m[2]), m[0]).toBeLessThanOrEqual(297);
      }
    }
  });
});
