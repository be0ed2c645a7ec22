// A small SVG line plot of our own: lines over a shared x axis, ticks at
// 1-2-5 steps, a legend. Paint goes in attributes and text is escaped, so the
// SVG can stand alone as a file or be placed inline in the HTML report.

import { escapeXml } from './stock-bar-svg.ts';

export interface PlotLine {
  label: string;
  x: readonly number[];
  y: readonly number[];
  dashed?: boolean;
  /** Draw the points as dots, not joined. */
  dots?: boolean;
}

export interface LinePlot {
  title: string;
  xLabel: string;
  yLabel: string;
  lines: readonly PlotLine[];
  width?: number;
  height?: number;
}

const COLOURS = ['#1f77b4', '#d62728', '#2ca02c', '#9467bd', '#ff7f0e', '#8c564b', '#17becf', '#7f7f7f'];
const MARGIN = { left: 64, right: 16, top: 34, bottom: 44 };
const FONT = 'font-family="sans-serif" font-size="11"';
/** A rough width of one character at that size, for the legend's room. */
const CHAR_PX = 6.2;

export function linePlotSvg(plot: LinePlot): string {
  const width = plot.width ?? 720;
  const height = plot.height ?? 300;
  // The legend stands in a right margin wide enough for its longest label, clear of the lines.
  const legendWidth = 40 + CHAR_PX * Math.max(0, ...plot.lines.map((l) => l.label.length));
  const inner = { w: width - MARGIN.left - MARGIN.right - legendWidth, h: height - MARGIN.top - MARGIN.bottom };
  const xs = plot.lines.flatMap((l) => l.x.filter(Number.isFinite));
  const ys = plot.lines.flatMap((l) => l.y.filter(Number.isFinite));
  const xr = axisRange(xs);
  const yr = axisRange(ys);
  const px = (x: number) => MARGIN.left + ((x - xr.lo) / (xr.hi - xr.lo)) * inner.w;
  const py = (y: number) => MARGIN.top + inner.h - ((y - yr.lo) / (yr.hi - yr.lo)) * inner.h;
  const xTicks = ticks(xr);
  const yTicks = ticks(yr);
  const grid = [
    ...xTicks.map((v) => `<line x1="${f(px(v))}" y1="${MARGIN.top}" x2="${f(px(v))}" y2="${MARGIN.top + inner.h}" stroke="#e0e0e0"/>`),
    ...yTicks.map((v) => `<line x1="${MARGIN.left}" y1="${f(py(v))}" x2="${MARGIN.left + inner.w}" y2="${f(py(v))}" stroke="#e0e0e0"/>`),
  ];
  const labels = [
    ...xTicks.map((v) => `<text x="${f(px(v))}" y="${MARGIN.top + inner.h + 14}" text-anchor="middle" ${FONT}>${tickText(v, xr.step)}</text>`),
    ...yTicks.map((v) => `<text x="${MARGIN.left - 6}" y="${f(py(v) + 4)}" text-anchor="end" ${FONT}>${tickText(v, yr.step)}</text>`),
    `<text x="${MARGIN.left + inner.w / 2}" y="${height - 8}" text-anchor="middle" ${FONT}>${escapeXml(plot.xLabel)}</text>`,
    `<text x="14" y="${MARGIN.top + inner.h / 2}" text-anchor="middle" transform="rotate(-90 14 ${MARGIN.top + inner.h / 2})" ${FONT}>${escapeXml(plot.yLabel)}</text>`,
    `<text x="${MARGIN.left}" y="18" font-family="sans-serif" font-size="13" font-weight="bold">${escapeXml(plot.title)}</text>`,
  ];
  const lines = plot.lines.map((l, i) => {
    const colour = COLOURS[i % COLOURS.length];
    if (l.dots) return thin(l.x, l.y, inner.w).map(([x, y]) => `<circle cx="${f(px(x))}" cy="${f(py(y))}" r="3" fill="${colour}"/>`).join('');
    const points = thin(l.x, l.y, inner.w).map(([x, y]) => `${f(px(x))},${f(py(y))}`).join(' ');
    return `<polyline fill="none" stroke="${colour}" stroke-width="1.4"${l.dashed ? ' stroke-dasharray="5 3"' : ''} points="${points}"/>`;
  });
  const legend = plot.lines.map((l, i) => {
    const y = MARGIN.top + 8 + i * 15;
    const x = MARGIN.left + inner.w + 12;
    const colour = COLOURS[i % COLOURS.length];
    const key = l.dots
      ? `<circle cx="${x + 10}" cy="${y}" r="3" fill="${colour}"/>`
      : `<line x1="${x}" y1="${y}" x2="${x + 20}" y2="${y}" stroke="${colour}" stroke-width="2"${l.dashed ? ' stroke-dasharray="5 3"' : ''}/>`;
    return `${key}<text x="${x + 26}" y="${y + 4}" ${FONT}>${escapeXml(l.label)}</text>`;
  });
  const frame = `<rect x="${MARGIN.left}" y="${MARGIN.top}" width="${inner.w}" height="${inner.h}" fill="none" stroke="#444"/>`;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(plot.title)}">`,
    `<rect width="${width}" height="${height}" fill="#fff"/>`,
    ...grid,
    frame,
    ...lines,
    ...labels,
    ...legend,
    '</svg>',
  ].join('\n');
}

interface Range {
  lo: number;
  hi: number;
  step: number;
}

/** The data's range widened to whole 1-2-5 steps; a flat or empty range gets room. */
export function axisRange(values: readonly number[]): Range {
  // reduce, not Math.min(...): a long series would overflow the argument list.
  let lo = values.length ? values.reduce((a, b) => Math.min(a, b)) : 0;
  let hi = values.length ? values.reduce((a, b) => Math.max(a, b)) : 1;
  if (hi - lo < 1e-12 * Math.max(1, Math.abs(lo))) {
    lo -= Math.max(1, Math.abs(lo) * 0.1);
    hi += Math.max(1, Math.abs(hi) * 0.1);
  }
  const step = niceStep((hi - lo) / 5);
  return { lo: Math.floor(lo / step) * step, hi: Math.ceil(hi / step) * step, step };
}

export function niceStep(raw: number): number {
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}

function ticks(r: Range): number[] {
  const n = Math.round((r.hi - r.lo) / r.step);
  return Array.from({ length: n + 1 }, (_, i) => r.lo + i * r.step);
}

function tickText(v: number, step: number): string {
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const text = v.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** At most the first and last point and each pixel column's lowest and highest, in order: the drawn shape is kept. */
function thin(x: readonly number[], y: readonly number[], columns: number): [number, number][] {
  const pts = x.map((v, i) => [v, y[i]] as [number, number]).filter(([a, b]) => Number.isFinite(a) && Number.isFinite(b));
  if (pts.length <= 2 * columns) return pts;
  const lo = pts[0][0];
  const span = pts[pts.length - 1][0] - lo || 1;
  const out: [number, number][] = [];
  let bucket: [number, number][] = [];
  let current = -1;
  const flush = () => {
    if (bucket.length === 0) return;
    const min = bucket.reduce((a, b) => (b[1] < a[1] ? b : a));
    const max = bucket.reduce((a, b) => (b[1] > a[1] ? b : a));
    out.push(...(min[0] <= max[0] ? [min, max] : [max, min]));
    bucket = [];
  };
  for (const p of pts) {
    const c = Math.floor(((p[0] - lo) / span) * columns);
    if (c !== current) flush(), (current = c);
    bucket.push(p);
  }
  flush();
  return out;
}

const f = (v: number): string => (Math.round(v * 10) / 10).toString();
