// PlotData to a vega-lite chart: one layer each for the lines, the marked
// points and the horizontal and vertical reference lines, all sharing one
// legend keyed by label (colour and dash together, series-style.ts). The y
// axis holds every value drawn with a little room above and below, so no line
// runs along the frame. Pure: the chart is data; src/render/plots/vega-svg.mjs
// draws it.

import type { TopLevelSpec } from 'vega-lite';
import type { PlotData } from '../../core/plots/plot-data.ts';
import { thinPoints } from './thin-points.ts';
import { chartFrame } from './chart-frame.ts';
import { cycle, DASHED, RULE_COLOURS, RULE_DASH, SERIES_COLOURS, SERIES_DASHES } from './series-style.ts';

export const PLOT_WIDTH = 600;
export const PLOT_HEIGHT = 240;

/** Room beside the data on the x axis where a vertical line could sit on the frame. */
const X_PAD = 0.03;

interface Row {
  label: string;
  x?: number;
  y?: number;
  order?: number;
}

export function plotSpec(plot: PlotData, size = { width: PLOT_WIDTH, height: PLOT_HEIGHT }): TopLevelSpec {
  const drawn = plot.lines.filter((l) => l.style !== 'dots');
  const dots = plot.lines.filter((l) => l.style === 'dots');
  const labels = [...plot.lines.map((l) => l.label), ...plot.rules.map((r) => r.label)];
  const nth = plot.rules.map((r, i) => plot.rules.slice(0, i).filter((q) => q.kind === r.kind).length);
  const colours = [...plot.lines.map((_, i) => cycle(SERIES_COLOURS, i)), ...plot.rules.map((r, i) => cycle(RULE_COLOURS[r.kind], nth[i]))];
  const dashes = [...plot.lines.map((l, i) => (l.style === 'dashed' ? DASHED : l.style === 'dots' ? SERIES_DASHES[0] : cycle(SERIES_DASHES, i))), ...plot.rules.map((r, i) => cycle(RULE_DASH[r.kind], nth[i]))];
  const legend = { labelLimit: 0, symbolType: 'stroke', symbolStrokeWidth: 2, symbolSize: 260 };
  const colour = { field: 'label', type: 'nominal', title: null, sort: labels, scale: { domain: labels, range: colours }, legend } as const;
  const dash = { field: 'label', type: 'nominal', title: null, sort: labels, scale: { domain: labels, range: dashes }, legend } as const;
  const x = { field: 'x', type: 'quantitative', title: plot.xLabel, ...xScale(plot) } as const;
  const y = { field: 'y', type: 'quantitative', title: plot.yLabel, scale: yScale(plot) } as const;
  const lineRows: Row[] = drawn.flatMap((l) => thinPoints(l.x, l.y, size.width / 2).map(([px, py], order) => ({ label: l.label, x: px, y: py, order })));
  const dotRows: Row[] = dots.flatMap((l) => l.x.map((px, i) => ({ label: l.label, x: px, y: l.y[i] })));
  const yRules: Row[] = plot.rules.filter((r) => r.axis === 'y').map((r) => ({ label: r.label, y: r.value }));
  const xRules: Row[] = plot.rules.filter((r) => r.axis === 'x').map((r) => ({ label: r.label, x: r.value }));
  const layers = [
    lineRows.length && { data: { values: lineRows }, mark: { type: 'line', strokeWidth: 1.6, clip: true }, encoding: { x, y, color: colour, strokeDash: dash, order: { field: 'order', type: 'quantitative' } } },
    yRules.length && { data: { values: yRules }, mark: { type: 'rule', strokeWidth: 1.3 }, encoding: { y, color: colour, strokeDash: dash } },
    xRules.length && { data: { values: xRules }, mark: { type: 'rule', strokeWidth: 1.3 }, encoding: { x, color: colour, strokeDash: dash } },
    dotRows.length && { data: { values: dotRows }, mark: { type: 'point', filled: true, size: 60, opacity: 1 }, encoding: { x, y, color: colour } },
  ].filter(Boolean);
  return {
    ...chartFrame(plot.title, size, {
      axis: { gridColor: '#e4e4e4' },
      legend: { orient: 'bottom', direction: 'vertical', columns: 2, labelFontSize: 11, columnPadding: 24 },
    }),
    layer: layers,
  } as TopLevelSpec;
}

/** Room above and below the values on the y axis, as a fraction of their span. */
const Y_PAD = 0.05;

/** Every value drawn, with room either side; from zero where all are at least zero, so no force axis goes negative. */
export function yScale(plot: PlotData): { domain: [number, number]; nice: boolean; zero: boolean } {
  const ys = [...plot.lines.flatMap((l) => l.y), ...plot.rules.filter((r) => r.axis === 'y').map((r) => r.value)].filter(Number.isFinite);
  if (ys.length === 0) return { domain: [0, 1], nice: false, zero: false };
  const lo = ys.reduce((a, b) => Math.min(a, b));
  const hi = ys.reduce((a, b) => Math.max(a, b));
  const pad = Y_PAD * (hi - lo || Math.abs(hi) || 1);
  return { domain: [lo >= 0 ? Math.max(0, lo - pad) : lo - pad, hi + pad], nice: false, zero: false };
}

/** With vertical lines, a little room past the outermost so none hides on the frame; otherwise the library's own domain. */
function xScale(plot: PlotData): { scale?: { domain: [number, number]; nice: boolean; zero: boolean } } {
  const rules = plot.rules.filter((r) => r.axis === 'x').map((r) => r.value);
  if (rules.length === 0) return {};
  const xs = [...plot.lines.flatMap((l) => l.x), ...rules].filter(Number.isFinite);
  const lo = xs.reduce((a, b) => Math.min(a, b));
  const hi = xs.reduce((a, b) => Math.max(a, b));
  const pad = X_PAD * (hi - lo || 1);
  return { scale: { domain: [lo - pad, hi + pad], nice: false, zero: false } };
}
