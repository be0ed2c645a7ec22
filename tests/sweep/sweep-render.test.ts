import { describe, expect, it } from 'vitest';
import { sweepResult, type SweepDefinition } from '../../src/core/sweep/sweep-result.ts';
import type { PointOutcome } from '../../src/core/sweep/point-outcome.ts';
import { sweepPoints } from '../../src/core/sweep/sweep-points.ts';
import type { SweepAxis } from '../../src/core/sweep/sweep-axis.ts';
import { sweepPlotSpec } from '../../src/render/sweep/sweep-plot.ts';
import { sweepFiles } from '../../src/render/sweep/sweep-files.ts';
import { steadySvgIds } from '../../src/render/plots/steady-svg-ids.ts';

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
    const line = sweepPlotSpec(result(1))!;
    const text = JSON.stringify(line.spec);
    expect(text).toMatch(/design point, 3\smm/);
    expect(text).toMatch(/envelope edge, 6.2\smm/);
    expect(text).toContain('"y":103');
    expect(text).toContain('fails (points)');
    const heat = JSON.stringify(sweepPlotSpec(result(2))!.spec);
    expect(heat).toContain('"type":"rect"');
    expect(heat).toContain('"design point"');
    expect(heat).toContain('"fails"');
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

  it('number the plot\'s gradients afresh in each file', () => {
    expect(steadySvgIds('<a fill="url(#gradient_7)"/><linearGradient id="gradient_7"/><b id="gradient_9"/>')).toBe('<a fill="url(#gradient_0)"/><linearGradient id="gradient_0"/><b id="gradient_1"/>');
  });
});
