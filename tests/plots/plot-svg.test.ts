import { describe, expect, it } from 'vitest';
import type { PlotData } from '../../src/core/plots/plot-data.ts';
import { PLOT_HEIGHT, PLOT_WIDTH, plotSpec } from '../../src/render/plots/plot-spec.ts';
import { plotSvg } from '../../src/render/plots/plot-svg.ts';
import { thinPoints } from '../../src/render/plots/thin-points.ts';
import { inlineSvg } from '../../src/render/inline-svg.ts';

// The plots are drawn by vega-lite; these tests measure the drawn SVG back
// against the data: a line from (0, 0) to (10, 10) spans the plot's width and
// its height but for the 5 % room kept above the highest value (none below:
// the values start at zero), a level line at y = 5 sits where that axis puts
// it, a vertical line where the padded x axis puts it.

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

const translate = (g: string) => {
  const m = /translate\(([-\d.]+),([-\d.]+)\)/.exec(g)!;
  return [Number(m[1]), Number(m[2])];
};

describe('plot SVG from vega-lite', async () => {
  const svg = await plotSvg(sample);
  const layer = (i: number) => new RegExp(`layer_${i}_marks"[^>]*>([\\s\\S]*?)</g>`).exec(svg)![1];

  it('draws the line from corner to corner of the plot', () => {
    // x runs from -0.3 to 10.3 (3 % room past the data, as a vertical line is drawn); y from 0 to 10.5.
    const d = /d="M([-\d.]+),([-\d.]+)L([-\d.]+),([-\d.]+)"/.exec(layer(0))!.slice(1).map(Number);
    const px = (x: number) => ((x + 0.3) / 10.6) * PLOT_WIDTH;
    expect(d[0]).toBeCloseTo(px(0), 2);
    expect(d[1]).toBeCloseTo(PLOT_HEIGHT, 2);
    expect(d[2]).toBeCloseTo(px(10), 2);
    expect(d[3]).toBeCloseTo(py(10), 2);
    expect(d[3]).toBeGreaterThan(0);
  });

  it('puts level lines at their values and the vertical line at its x', () => {
    const levels = [...layer(1).matchAll(/<line[^>]*>/g)].map((m) => translate(m[0])[1]);
    expect(levels).toHaveLength(2);
    expect(levels[0]).toBeCloseTo(py(5), 6);
    expect(levels[1]).toBeCloseTo(py(7), 6);
    const [x] = translate(/<line[^>]*>/.exec(layer(2))![0]);
    expect(x).toBeCloseTo((3.3 / 10.6) * PLOT_WIDTH, 2);
  });

  it('gives two limits of one kind different colours and dashes, and escapes the title', () => {
    const strokes = [...layer(1).matchAll(/stroke="([^"]+)"[^>]*stroke-dasharray="([^"]*)"/g)].map((m) => `${m[1]} ${m[2]}`);
    expect(new Set(strokes).size).toBe(2);
    expect(svg).toContain('a &lt;b&gt; &amp; c');
    for (const label of ['line', 'point', 'five', 'seven', 'three']) expect(svg).toContain(`>${label}</text>`);
    expect(inlineSvg(svg)).not.toBeNull();
  });

  it('keeps the legend in the order of the lines, then the reference lines', () => {
    const spec = plotSpec(sample) as unknown as { layer: { encoding: { color: { scale: { domain: string[] } } } }[] };
    expect(spec.layer[0].encoding.color.scale.domain).toEqual(['line', 'point', 'five', 'seven', 'three']);
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
