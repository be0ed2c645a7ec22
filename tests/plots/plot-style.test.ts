import { describe, expect, it } from 'vitest';
import { plotSvg } from '../../src/render/plots/plot-svg.ts';
import { RULE_DASH, SERIES_COLOURS, SERIES_DASHES } from '../../src/render/plots/series-style.ts';
import { floorTestPlot } from '../../src/render/floor-test-plot.ts';
import { estimateFloorTest } from '../../src/core/floor-test/estimate-floor-test.ts';
import { syntheticDrop } from '../../scripts/synthetic-drop-record.ts';
import { reportPlotList } from '../../src/render/report-plots.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';
import type { PlotData } from '../../src/core/plots/plot-data.ts';

// Every plot names the unit of each axis, and its series differ in dash as
// well as in colour, so they read in grey and without colour vision.

/** The Okabe-Ito set (Okabe and Ito 2008, "Color Universal Design"), as published. */
const OKABE_ITO = ['#000000', '#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7'];

const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
if (!p.ok) throw new Error('demo does not prepare');
const report = reportPlotList(runCheck(p.spec, p.entries, rulesData)).map(([, plot]) => plot);
const drop = syntheticDrop({ mass_kg: 80, natural_frequency_hz: 6, damping_ratio: 0.08, drop_height_mm: 20, noise_mm: 0.05, sample_rate_hz: 500, duration_s: 2.5, lead_s: 0.1, seed: 3 });
const floorTest = floorTestPlot(drop, estimateFloorTest(drop, 80));

describe('plot axes', () => {
  it.each([...report, floorTest].map((x) => [x.id, x] as [string, PlotData]))('%s: both axes name their unit in brackets', (_id, plot) => {
    expect(plot.xLabel).toMatch(/\([^)]+\)/);
    expect(plot.yLabel).toMatch(/\([^)]+\)/);
  });

  it('the report has its two plots and three for each of the five ride cases', () => {
    expect(report).toHaveLength(2 + 3 * 5);
  });
});

describe('series style', () => {
  it('takes its colours from the published colour-blind-safe set', () => {
    for (const c of SERIES_COLOURS) expect(OKABE_ITO).toContain(c);
    expect(new Set(SERIES_COLOURS).size).toBe(SERIES_COLOURS.length);
  });

  it('gives the first six series six different dash patterns, none a reference line\'s', () => {
    const key = (d: number[]) => d.join(' ');
    expect(new Set(SERIES_DASHES.map(key)).size).toBe(6);
    const rules = Object.values(RULE_DASH).flat().map(key);
    for (const d of SERIES_DASHES) expect(rules).not.toContain(key(d));
  });

  it('puts colour and dash on each line of a chart, one per label', () => {
    const plot: PlotData = { id: 'x', title: 't', caption: 'c', xLabel: 'x (s)', yLabel: 'y (N)', rules: [], lines: [0, 1, 2, 3].map((i) => ({ label: `s${i}`, x: [0, 1], y: [i, i + 1] })) };
    const drawn = [...plotSvg(plot).matchAll(/<path class="line"[^>]*>/g)].map((m) => ({ colour: /stroke="([^"]+)"/.exec(m[0])![1], dash: /stroke-dasharray="([^"]+)"/.exec(m[0])?.[1] ?? 'solid' }));
    expect(drawn.map((d) => d.colour)).toEqual(SERIES_COLOURS.slice(0, 4));
    expect(new Set(drawn.map((d) => d.dash)).size).toBe(4);
  });
});
