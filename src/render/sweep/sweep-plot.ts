import type { PlotData, PlotLine, PlotRule } from '../../core/plots/plot-data.ts';
import type { PointOutcome } from '../../core/sweep/point-outcome.ts';
import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { formatQuantity } from '../../core/format/number-format.ts';
import { heatMapSvg, type HeatCell, type HeatMark } from '../plots/heat-map-svg.ts';
import { plotSvg } from '../plots/plot-svg.ts';

// The sweep's one picture: over one varied value, a line of the first chosen
// figure with the points of each verdict marked, the design point and the
// envelope's edges as vertical lines; over two or three, a heat map of the
// figure over the first two (a third held at its grid value nearest the
// design point) with the points that do not pass marked and the design point
// ringed. Where no point gives the figure, the worst utilisation is drawn.

export const SWEEP_PLOT_FILE = 'sweep-plot.svg';

interface Plotted {
  label: string;
  of(p: PointOutcome): number | null;
}

const axisLabel = (v: SweepResult['varied'][number]) => (v.unit && v.unit !== '1' ? `${v.path} (${v.unit})` : v.path);

function plotted(r: SweepResult): Plotted {
  const f = r.figures[0];
  if (f && r.points.some((p) => p.figures[0] !== null)) return { label: f.unit && f.unit !== '1' ? `${f.name} (${f.unit})` : f.name, of: (p) => p.figures[0] };
  return { label: 'worst utilisation', of: (p) => p.worst_utilisation };
}

const KIND = { fail: 'fail', warning: 'warning', refused: 'refused', error: 'error' } as const;

export function sweepPlotTitle(r: SweepResult): string {
  return `${plotted(r).label} over ${r.varied.slice(0, 2).map((v) => v.path).join(' and ')}`;
}

function linePlot(r: SweepResult, q: Plotted): PlotData {
  const v = r.varied[0];
  const pts = [...r.points].sort((a, b) => a.values[0] - b.values[0]).filter((p) => q.of(p) !== null);
  const line: PlotLine = { label: q.label, x: pts.map((p) => p.values[0]), y: pts.map((p) => q.of(p)!) };
  const groups: [string, (p: PointOutcome) => boolean][] = [
    ['passes', (p) => p.verdict === 'pass' || p.verdict === 'advice'],
    ['warning', (p) => p.verdict === 'warning'],
    ['fails', (p) => p.verdict === 'fail' || p.verdict === 'error'],
  ];
  const dots = groups.flatMap(([label, is]): PlotLine[] => {
    const g = pts.filter(is);
    return g.length ? [{ label: `${label} (points)`, x: g.map((p) => p.values[0]), y: g.map((p) => q.of(p)!), style: 'dots' }] : [];
  });
  const rules: PlotRule[] = [{ label: `design point, ${formatQuantity(v.design_value, v.unit)}`, axis: 'x', value: v.design_value, kind: 'position' }];
  for (const i of r.envelope?.[0].intervals ?? [])
    for (const e of [i.low_edge, i.high_edge]) if (e) rules.push({ label: `envelope edge, ${formatQuantity(e.pass, v.unit)}`, axis: 'x', value: e.pass, kind: 'threshold' });
  const refused = r.points.length - pts.length;
  return {
    id: 'sweep',
    title: sweepPlotTitle(r),
    caption: `Each dot is a point of the sweep, by its verdict${refused ? `; ${refused} point(s) without a value are left out` : ''}.`,
    xLabel: axisLabel(v),
    yLabel: q.label,
    lines: [line, ...dots],
    rules,
  };
}

/** Each point's cell: halfway to its neighbours on a grid, the whole square of its stratum for scattered points. */
function cells(r: SweepResult, points: PointOutcome[], q: Plotted): HeatCell[] {
  const [a, b] = r.varied;
  const half = (v: typeof a) => (v.count > 1 ? (v.to - v.from) / (v.count - 1) / 2 : Math.max(Math.abs(v.from) * 0.01, 0.5));
  const hs = r.mode.kind === 'grid' ? [half(a), half(b)] : [(a.to - a.from) / (2 * Math.sqrt(points.length || 1)), (b.to - b.from) / (2 * Math.sqrt(points.length || 1))];
  return points.map((p) => ({ x0: p.values[0] - hs[0], x1: p.values[0] + hs[0], y0: p.values[1] - hs[1], y1: p.values[1] + hs[1], value: q.of(p) }));
}

function heatPoints(r: SweepResult): PointOutcome[] {
  if (r.varied.length < 3 || r.mode.kind !== 'grid') return r.points;
  const c = r.varied[2];
  const grid = r.points.map((p) => p.values[2]);
  const held = grid.reduce((best, v) => (Math.abs(v - c.design_value) < Math.abs(best - c.design_value) ? v : best), grid[0]);
  return r.points.filter((p) => p.values[2] === held);
}

/** The picture of the sweep as SVG text, or null where there is nothing to draw. */
export function sweepPlot(r: SweepResult): { svg: string; caption: string } | null {
  if (r.points.length === 0) return null;
  const q = plotted(r);
  if (r.varied.length === 1) {
    const plot = linePlot(r, q);
    return plot.lines[0].x.length ? { svg: plotSvg(plot), caption: plot.caption } : null;
  }
  const pts = heatPoints(r);
  const marks: HeatMark[] = pts.flatMap((p) => (p.verdict in KIND ? [{ x: p.values[0], y: p.values[1], kind: KIND[p.verdict as keyof typeof KIND] }] : []));
  const [a, b] = r.varied;
  const third = r.varied[2];
  const caption = [
    `Colour: ${q.label} at each point (grey where there is none). Marked: the points that do not pass; ringed: the design point.`,
    third ? ` ${third.path} is held at ${formatQuantity(pts[0]?.values[2] ?? third.design_value, third.unit)}, its ${r.mode.kind === 'grid' ? 'grid value nearest the design point' : 'sampled values all shown together'}.` : '',
  ].join('');
  const map = { title: sweepPlotTitle(r), xLabel: axisLabel(a), yLabel: axisLabel(b), valueLabel: q.label, cells: cells(r, pts, q), scatter: r.mode.kind === 'samples', marks, design: { x: a.design_value, y: b.design_value } };
  return { svg: heatMapSvg(map), caption };
}
