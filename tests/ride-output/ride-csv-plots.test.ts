// The ride command's CSV and plots from a ride case the model ran.
import { describe, expect, it } from 'vitest';
import { rideCsv, csvField } from '../../src/render/ride-csv.ts';
import { ridePlotFiles, ridePlotNames } from '../../src/render/ride-plots.ts';
import { inlineSvg } from '../../src/render/inline-svg.ts';
import { rideCaseSummary, strideSeries } from '../../src/core/result/ride-summary.ts';
import { demoRide } from '../fixtures/sample-ride.ts';

describe('rideCsv', () => {
  const r = demoRide().results['rough-ridge'];
  const lines = rideCsv(r.series).trimEnd().split('\n');

  it('has one column per channel with its unit, time first, a row per sample', () => {
    expect(lines[0].split(',')).toEqual(['time (s)', ...r.series.channels.map((c) => `${c.name} (${c.unit})`)]);
    expect(lines).toHaveLength(r.series.t_s.length + 1);
    const k = Math.floor(r.series.t_s.length / 2);
    const row = lines[k + 1].split(',').map(Number);
    expect(row[0]).toBeCloseTo(r.series.t_s[k], 8);
    r.series.channels.forEach((c, i) => expect(row[i + 1]).toBeCloseTo(c.values[k], 4));
  });

  it('quotes a header that holds a comma or a quote', () => {
    expect(csvField('driver, left')).toBe('"driver, left"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('plain')).toBe('plain');
  });
});

describe('ride plots', () => {
  it('heights, floor forces and wheel and yoke forces, each with its channels', () => {
    const r = demoRide().results['stone-one-wheel'];
    const files = ridePlotFiles(r.case, r.title, r.series);
    expect(files.map(([n]) => n)).toEqual(['ride-stone-one-wheel-heights.svg', 'ride-stone-one-wheel-floor-forces.svg', 'ride-stone-one-wheel-support-forces.svg']);
    expect(ridePlotNames(r.case, r.series)).toEqual(files.map(([n]) => n));
    const [, heights] = files[0];
    const [, floor] = files[1];
    for (const c of r.series.channels) {
      if (c.unit === 'mm') expect(heights).toContain(c.name);
      if (/floor force$/.test(c.name)) expect(floor).toContain(c.name);
    }
    for (const [, svg] of files) expect(inlineSvg(svg)).not.toBeNull();
  });

  it('the summary keeps every k-th sample and the last, without the full series', () => {
    const r = demoRide().results.drop;
    const s = rideCaseSummary(r, 100);
    expect(s).not.toHaveProperty('series');
    expect(s.plot.t_s.length).toBeLessThanOrEqual(101);
    expect(s.plot.t_s.at(-1)).toBe(r.series.t_s.at(-1));
    expect(s.plot.t_s[1]).toBe(r.series.t_s[s.plot_stride]);
    expect(strideSeries(r.series, 1).t_s).toEqual(r.series.t_s);
    const k = 7;
    // Five significant digits kept.
    const full = r.series.channels[0].values[k * s.plot_stride];
    expect(Math.abs(s.plot.channels[0].values[k] - full)).toBeLessThanOrEqual(5e-5 * Math.abs(full) + 1e-12);
  });
});
