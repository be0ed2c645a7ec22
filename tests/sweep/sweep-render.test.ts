import { describe, expect, it } from 'vitest';
import { sweepResult, type SweepDefinition } from '../../src/core/sweep/sweep-result.ts';
import type { PointOutcome } from '../../src/core/sweep/point-outcome.ts';
import { sweepPoints } from '../../src/core/sweep/sweep-points.ts';
import type { SweepAxis } from '../../src/core/sweep/sweep-axis.ts';
import { sweepPlot } from '../../src/render/sweep/sweep-plot.ts';
import { readFileSync } from 'node:fs';
import { HEAT_MARKS, heatColour, NO_VALUE } from '../../src/render/plots/heat-map-svg.ts';
import { sweepFiles } from '../../src/render/sweep/sweep-files.ts';

// A made-up sweep (no check run): the load is 100 + a - b, and a point fails where a > 6.25; the outputs drawn from it.
const axes: SweepAxis[] = [
  { path: 'a_mm', steps: ['a_mm'], from: 0, to: 10, count: 11, unit: 'mm' },
  { path: 'b_mm', steps: ['b_mm'], from: 0, to: 4, count: 3, unit: 'mm' },
];
const design = [3, 2];
const outcome = (p: { index: number; values: number[]; line?: number; design?: true }): PointOutcome => ({
  ...p,
  verdict: p.values[0] > 6.25 ? 'fail' : 'pass',
  worst_utilisation: p.values[0] / 6,
  worst: { rule: 'made.up', subject: 'a' },
  figures: [100 + p.values[0] - (p.values[1] ?? 0)],
});

function result(n: 1 | 2) {
  const ax = axes.slice(0, n);
  const pts = sweepPoints({ axes: ax, mode: { kind: 'grid' }, design: design.slice(0, n) });
  const def: SweepDefinition = { spec_name: 'made up', spec_file: 'x.yaml', statics: true, mode: { kind: 'grid' }, axes: ax, design: design.slice(0, n), figures: [{ name: 'load', unit: 'N' }], total: pts.length };
  const edge = { pass: 6.2, fail: 6.3, beyond: { verdict: 'fail' as const, worst_utilisation: 1.002, worst: { rule: 'made.up', subject: 'a' }, figures: [104] }, checks: 7 };
  return sweepResult(def, pts.map(outcome), [edge]);
}

describe('the sweep\'s outputs', () => {
  it('give the envelope from the line and its bisected edge, and the robust range from the grid', () => {
    const r = result(2);
    expect(r.envelope![0].intervals).toEqual([{ low: 0, high: 6.2, low_edge: null, high_edge: expect.objectContaining({ pass: 6.2, fail: 6.3 }) }]);
    expect(r.envelope![1].intervals).toEqual([{ low: 0, high: 4, low_edge: null, high_edge: null }]);
    // b passes for every grid value of a only if no value of a fails: none does; a passes with any b up to 6.
    expect(r.robust!.map((g) => g.intervals)).toEqual([[{ low: 0, high: 6 }], []]);
  });

  it('draw a line plot over one value and a heat map over two, the design point marked', () => {
    const line = sweepPlot(result(1))!.svg;
    expect(line).toMatch(/>design point, 3\smm</);
    expect(line).toMatch(/>envelope edge, 6.2\smm</);
    expect(line).toContain('>fails (points)<');
    // One dot per point (11), and each in the key.
    expect(line.match(/<circle /g)!.length).toBe(11 + 2);
    const heat = sweepPlot(result(2))!.svg;
    const cells = /<g class="cells">([\s\S]*?)<\/g>/.exec(heat)![1];
    expect(cells.match(/<rect /g)).toHaveLength(33);
    // The load runs from 96 (a = 0, b = 4) to 110 (a = 10, b = 0): the pale end and the full end of the scale.
    expect(cells).toContain(`fill="${heatColour(0)}"`);
    expect(cells).toContain(`fill="${heatColour(1)}"`);
    // The failing points (a = 7 to 10, three values of b each) marked, each with the fail colour; the design point ringed.
    expect(heat.split(`fill="${HEAT_MARKS.fail.colour}"`).length - 1).toBe(12 + 1);
    expect(heat).toMatch(/fill="none" stroke="#000000" stroke-width="2"/);
    expect(heat).toContain('>fails<');
    expect(heat).toContain('>design point<');
    expect(heat).not.toMatch(/NaN|Infinity/);
  });

  it('write the envelope, the robust ranges and the cautions in the report', () => {
    const files = new Map(sweepFiles(result(2), { svg: '<svg xmlns="http://www.w3.org/2000/svg"></svg>', caption: 'c' }));
    const md = files.get('sweep.md')!;
    expect(md).toContain('Feasible envelope');
    expect(md).toContain('Robust ranges');
    expect(md).toMatch(/fail; highest utilisation 1 \(made\.up, a\) at 6\.3\smm/);
    expect(md).toContain('This is a planning aid, not a certification');
    expect(md).toContain('Statics only');
    expect(files.get('sweep.html')).toContain('<svg');
    expect(files.get('sweep.csv')!.split('\n')[1]).toBe('point,a_mm (mm),b_mm (mm),verdict,worst utilisation,worst rule,worst subject,load (N),reason');
  });
});

describe('the heat map\'s colours', () => {
  it('are those docs/style.md names: pale blue-grey to the series blue, grey for no value', () => {
    const style = readFileSync(new URL('../../docs/style.md', import.meta.url), 'utf8');
    for (const c of [heatColour(0), heatColour(1), NO_VALUE]) expect(style.toLowerCase()).toContain(`\`${c.toLowerCase()}\``);
    // Halfway is halfway in each channel (straight through sRGB).
    expect(heatColour(0.5)).toBe('#79b4d6');
  });
});
