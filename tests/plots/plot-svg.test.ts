import { describe, expect, it } from 'vitest';
import type { PlotData } from '../../src/core/plots/plot-data.ts';
import { PLOT_HEIGHT, PLOT_WIDTH, plotSvg } from '../../src/render/plots/plot-svg.ts';
import { niceDomain, niceNumber, tickText, ticksWithin } from '../../src/render/plots/chart-scale.ts';
import { thinPoints } from '../../src/render/plots/thin-points.ts';
import { inlineSvg } from '../../src/render/inline-svg.ts';

// The plots are drawn by our own SVG writer; these tests measure the drawn SVG
// back against the data: a line from (0, 0) to (10, 10) spans the plot's width
// and its height but for the 5 % room kept above the highest value (none
// below: the values start at zero), a level line at y = 5 sits where that axis
// puts it, a vertical line where the padded x axis puts it. Paper positions
// are read inside the plot area's group, whose origin is its top left.

const sample: PlotData = {
  id: 'sample',
  title: 'a <b> & c',
  caption: 'test',
  xLabel: 'x (mm)',
  yLabel: 'y (N)',
  lines: [{ label: 'line', x: [0, 10], y: [0, 10] }, { label: 'point', x: [4], y: [4], style: 'dots' }],
  rules: [
    { label: 'five', axis: 'y', value: 5, kind: 'hard' },
    { label: 'seven', axis: 'y', value: 7, kind: 'hard' },
    { label: 'three', axis: 'x', value: 3, kind: 'position' },
  ],
};

/** Paper y of a value on the y axis, 0 to 10.5. */
const py = (y: number) => PLOT_HEIGHT * (1 - y / 10.5);
/** Paper x: the axis runs from -0.3 to 10.3 (3 % room past the data, as a vertical line is drawn). */
const px = (x: number) => ((x + 0.3) / 10.6) * PLOT_WIDTH;
const attr = (el: string, name: string) => Number(new RegExp(`\\s${name}="([-\\d.]+)"`).exec(el)![1]);

describe('plot SVG', () => {
  const svg = plotSvg(sample);
  const rules = [...svg.matchAll(/<line class="rule"[^>]*>/g)].map((m) => m[0]);

  it('draws the line from corner to corner of the plot', () => {
    const d = /<path class="line" d="M([-\d.]+),([-\d.]+)L([-\d.]+),([-\d.]+)"/.exec(svg)!.slice(1).map(Number);
    expect(d[0]).toBeCloseTo(px(0), 2);
    expect(d[1]).toBeCloseTo(PLOT_HEIGHT, 2);
    expect(d[2]).toBeCloseTo(px(10), 2);
    expect(d[3]).toBeCloseTo(py(10), 2);
    expect(d[3]).toBeGreaterThan(0);
  });

  it('puts level lines at their values across the plot, the vertical line at its x, the point at its place', () => {
    expect(rules).toHaveLength(3);
    expect(attr(rules[0], 'y1')).toBeCloseTo(py(5), 2);
    expect(attr(rules[1], 'y1')).toBeCloseTo(py(7), 2);
    expect([attr(rules[0], 'x1'), attr(rules[0], 'x2')]).toEqual([0, PLOT_WIDTH]);
    expect(attr(rules[2], 'x1')).toBeCloseTo(px(3), 2);
    expect([attr(rules[2], 'y1'), attr(rules[2], 'y2')]).toEqual([0, PLOT_HEIGHT]);
    const dot = /<circle cx="([-\d.]+)" cy="([-\d.]+)"/.exec(svg.slice(svg.indexOf('<line class="rule"')))!.slice(1).map(Number);
    expect(dot[0]).toBeCloseTo(px(4), 2);
    expect(dot[1]).toBeCloseTo(py(4), 2);
  });

  it('gives two limits of one kind different colours and dashes, and escapes the title', () => {
    const strokes = rules.slice(0, 2).map((r) => `${/stroke="([^"]+)"/.exec(r)![1]} ${/stroke-dasharray="([^"]*)"/.exec(r)![1]}`);
    expect(new Set(strokes).size).toBe(2);
    expect(svg).toContain('a &lt;b&gt; &amp; c');
    for (const label of ['line', 'point', 'five', 'seven', 'three']) expect(svg).toContain(`>${label}</text>`);
    expect(inlineSvg(svg)).not.toBeNull();
  });

  it('keeps the key in the order of the lines, then the reference lines', () => {
    const key = /<g class="legend">([\s\S]*?)<\/g>/.exec(svg)![1];
    expect([...key.matchAll(/>([^<]+)<\/text>/g)].map((m) => m[1])).toEqual(['line', 'point', 'five', 'seven', 'three']);
  });

  it('writes the same bytes for the same plot, and no number that is not finite', () => {
    expect(plotSvg(sample)).toBe(svg);
    expect(svg).not.toMatch(/NaN|Infinity/);
    const gappy: PlotData = { ...sample, lines: [{ label: 'gaps', x: [0, 1, 2, 3], y: [1, NaN, Infinity, 2] }] };
    expect(plotSvg(gappy)).not.toMatch(/NaN|Infinity/);
    // A reference line without a value is left out, key and all; an empty plot and a flat line still draw.
    const unset: PlotData = { ...sample, rules: [{ label: 'unset', axis: 'y', value: NaN, kind: 'hard' }, { label: 'far', axis: 'x', value: Infinity, kind: 'position' }] };
    expect(plotSvg(unset)).not.toMatch(/NaN|Infinity|unset|far/);
    expect(plotSvg({ ...sample, lines: [], rules: [] })).not.toMatch(/NaN|Infinity/);
    expect(plotSvg({ ...sample, lines: [{ label: 'flat', x: [0, 1], y: [5, 5] }], rules: [] })).toMatch(/<path class="line" d="M[\d.]+,([\d.]+)L[\d.]+,\1"/);
  });
});

describe('axis ticks (Heckbert, "Nice numbers for graph labels", Graphics Gems 1990)', () => {
  it('rounds to 1, 2 or 5 times a power of ten, as the method defines', () => {
    // Rounded: below 1.5 gives 1, below 3 gives 2, below 7 gives 5, else 10; not rounded: the next of them at or above.
    expect([0.43, 0.73, 1.4, 2.9, 6.9, 7.1].map((x) => niceNumber(x, true))).toEqual([0.5, 1, 1, 2, 5, 10]);
    expect([0.73, 1.4, 2.9, 6.9, 10].map((x) => niceNumber(x, false))).toEqual([1, 2, 5, 10, 10]);
    expect(niceNumber(2300, true)).toBe(2000);
  });

  it('ticks a range by whole steps and widens a free range to them', () => {
    expect(ticksWithin([0, 10.5], 6).values).toEqual([0, 2, 4, 6, 8, 10]);
    expect(ticksWithin([-0.3, 10.3], 8).values).toEqual([0, 2, 4, 6, 8, 10]);
    const t = ticksWithin([0.812, 1.634], 8);
    expect(t.values.map((v) => tickText(v, t.decimals))).toEqual(['0.9', '1.0', '1.1', '1.2', '1.3', '1.4', '1.5', '1.6']);
    expect(niceDomain([3, 97], 8)).toEqual([0, 100]);
    expect(tickText(-0.0000001, 1)).toBe('0.0');
    expect(tickText(12500, 0)).toBe('12\u2009500');
    // Past six decimals the power of ten is written out.
    expect(tickText(2e-10, 10)).toBe('2.00e\u221210');
  });
});

describe('thinPoints', () => {
  it('keeps a long series to two points per column and keeps its spike', () => {
    const n = 100_000;
    const x = Array.from({ length: n }, (_, i) => i);
    const y = x.map((i) => (i === 77_777 ? 1000 : Math.sin(i / 1000)));
    const kept = thinPoints(x, y, 500);
    expect(kept.length).toBeLessThanOrEqual(2 * 500);
    expect(kept).toContainEqual([77_777, 1000]);
    expect(kept[0]).toEqual([0, 0]);
    expect(kept.at(-1)![0]).toBe(n - 1);
    // In order along x.
    kept.slice(1).forEach(([px], i) => expect(px).toBeGreaterThanOrEqual(kept[i][0]));
  });

  it('leaves a short series alone and drops points that are not numbers', () => {
    expect(thinPoints([0, 1, 2], [1, NaN, 3], 10)).toEqual([[0, 1], [2, 3]]);
  });
});
