import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { SERIES_COLOURS } from './series-style.ts';
import { chartSvg } from './chart-frame.ts';
import { chartText, LEGEND_FONT, n2, symbolCentre, type LegendEntry } from './chart-legend.ts';
import { textWidth } from '../drawings/text-box.ts';
import { linear, spread, tickText, ticksWithin, type Domain } from './chart-scale.ts';

// A heat map: a value over two axes, one cell per grid point (or one dot per
// point where the points are scattered), with marks of their own on the
// points of a kind (the failing points of a sweep) and one ringed point (the
// design point). The value's colour runs from a pale to a full blue, its
// scale drawn beside the plot; a point without a value is grey.

export interface HeatCell {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  value: number | null;
}

export interface HeatMark {
  x: number;
  y: number;
  kind: 'fail' | 'warning' | 'refused' | 'error';
}

export interface HeatMap {
  title: string;
  xLabel: string;
  yLabel: string;
  valueLabel: string;
  cells: HeatCell[];
  /** Points, not a grid: each cell is drawn as a dot at its centre. */
  scatter: boolean;
  marks: HeatMark[];
  design: { x: number; y: number } | null;
}

export const HEAT_WIDTH = 560;
export const HEAT_HEIGHT = 400;

type Shape = 'square' | 'triangle' | 'cross' | 'diamond' | 'circle';

/** Each kind of marked point: its key text, shape and colour (the severity colours of the reports). */
export const HEAT_MARKS: Record<HeatMark['kind'] | 'design', { label: string; shape: Shape; colour: string }> = {
  fail: { label: 'fails', shape: 'square', colour: SEVERITY_COLOURS.fail.fill },
  warning: { label: 'warning', shape: 'triangle', colour: SEVERITY_COLOURS.warning.fill },
  refused: { label: 'spec refused', shape: 'cross', colour: '#3D3D3D' },
  error: { label: 'a rule could not run', shape: 'diamond', colour: SEVERITY_COLOURS.error.fill },
  design: { label: 'design point', shape: 'circle', colour: '#000000' },
};
/** Where no value is given at a point (a refused point, a figure that does not apply). */
export const NO_VALUE = '#D9D9D9';
const LOW = '#F1F6FA';
const HIGH = SERIES_COLOURS[0];
/** The colour bar: its width and its steps. */
const BAR = 14;
const BAR_STEPS = 48;

/** A shape of radius r centred on (x, y), filled. */
function shape(kind: Shape, x: number, y: number, r: number, colour: string): string {
  const p = (pts: [number, number][]) => `<path d="M${pts.map(([a, b]) => `${n2(x + a * r)},${n2(y + b * r)}`).join('L')}Z" fill="${colour}"/>`;
  switch (kind) {
    case 'square':
      return p([[-0.8, -0.8], [0.8, -0.8], [0.8, 0.8], [-0.8, 0.8]]);
    case 'triangle':
      return p([[0, -1], [0.95, 0.75], [-0.95, 0.75]]);
    case 'diamond':
      return p([[0, -1.1], [0.8, 0], [0, 1.1], [-0.8, 0]]);
    case 'cross': {
      const t = 0.3;
      return p([[-t, -1], [t, -1], [t, -t], [1, -t], [1, t], [t, t], [t, 1], [-t, 1], [-t, t], [-1, t], [-1, -t], [-t, -t]]);
    }
    case 'circle':
      return `<circle cx="${n2(x)}" cy="${n2(y)}" r="${n2(r)}" fill="${colour}"/>`;
  }
}

/** The colour of a value's place t in [0, 1] between the pale end and the full one (straight through sRGB). */
export function heatColour(t: number): string {
  const a = Number.parseInt(LOW.slice(1), 16);
  const b = Number.parseInt(HIGH.slice(1), 16);
  const mix = (shift: number) => Math.round(((a >> shift) & 255) * (1 - t) + ((b >> shift) & 255) * t);
  return `#${[16, 8, 0].map((s) => mix(s).toString(16).padStart(2, '0')).join('')}`;
}

export function heatMapSvg(map: HeatMap, size = { width: HEAT_WIDTH, height: HEAT_HEIGHT }): string {
  const extent = (v: number[]): Domain => (v.length ? [Math.min(...v), Math.max(...v)] : [0, 1]);
  const xDomain = extent(map.cells.flatMap((c) => [c.x0, c.x1]));
  const yDomain = extent(map.cells.flatMap((c) => [c.y0, c.y1]));
  const values = map.cells.flatMap((c) => (c.value !== null && Number.isFinite(c.value) ? [c.value] : []));
  const vDomain = spread(extent(values));
  const place = linear(vDomain, [0, 1]);
  const colourOf = (v: number | null) => (v === null || !Number.isFinite(v) ? NO_VALUE : heatColour(Math.min(1, Math.max(0, place(v)))));
  const cellW = map.cells.length ? (size.width * (map.cells[0].x1 - map.cells[0].x0)) / (xDomain[1] - xDomain[0] || 1) : 10;
  const cellH = map.cells.length ? (size.height * (map.cells[0].y1 - map.cells[0].y0)) / (yDomain[1] - yDomain[0] || 1) : 10;
  // A mark fits inside its cell, but never smaller than can be seen.
  const markR = map.scatter ? 3.2 : Math.max(1.6, Math.min(5, 0.3 * Math.min(cellW, cellH)));
  const kinds = (['fail', 'warning', 'refused', 'error', 'design'] as const).filter((k) => (k === 'design' ? map.design !== null : map.marks.some((m) => m.kind === k)));
  const legend: LegendEntry[] = kinds.map((k) => ({ label: HEAT_MARKS[k].label, symbol: (x, y) => shape(HEAT_MARKS[k].shape, symbolCentre(x), y, 4.5, HEAT_MARKS[k].colour) }));
  const ticks = ticksWithin(vDomain, 6);
  const tickWidth = Math.max(0, ...ticks.values.map((v) => textWidth(tickText(v, ticks.decimals), { size: LEGEND_FONT }))) + 8;
  const right = {
    width: BAR + 6 + tickWidth + 18,
    draw: (x0: number, height: number) => {
      const bar = height * 0.6;
      const top = (height - bar) / 2;
      const at = linear(vDomain, [top + bar, top]);
      const steps = Array.from({ length: BAR_STEPS }, (_, i) => `<rect x="${n2(x0)}" y="${n2(top + (bar * (BAR_STEPS - 1 - i)) / BAR_STEPS)}" width="${BAR}" height="${n2(bar / BAR_STEPS + 0.5)}" fill="${heatColour((i + 0.5) / BAR_STEPS)}"/>`);
      const labels = ticks.values.map((v) => chartText(x0 + BAR + 4, at(v) + 4, tickText(v, ticks.decimals), LEGEND_FONT));
      const title = chartText(0, 0, map.valueLabel, LEGEND_FONT, 'middle', ` transform="translate(${n2(x0 + BAR + tickWidth + 12)},${n2(height / 2)}) rotate(-90)"`);
      return `<g class="colour-scale">${steps.join('')}<rect x="${n2(x0)}" y="${n2(top)}" width="${BAR}" height="${n2(bar)}" fill="none" stroke="#444444"/>${labels.join('')}${title}</g>`;
    },
  };
  const spec = { title: map.title, size, x: xDomain, y: yDomain, xLabel: map.xLabel, yLabel: map.yLabel, grid: false, legend, legendColumns: legend.length, right: values.length ? right : undefined };
  return chartSvg(spec, ({ x, y }) => {
    const cells = map.cells.map((c) =>
      map.scatter
        ? `<circle cx="${n2(x((c.x0 + c.x1) / 2))}" cy="${n2(y((c.y0 + c.y1) / 2))}" r="4.7" fill="${colourOf(c.value)}"/>`
        : `<rect x="${n2(x(c.x0))}" y="${n2(y(c.y1))}" width="${n2(x(c.x1) - x(c.x0))}" height="${n2(y(c.y0) - y(c.y1))}" fill="${colourOf(c.value)}"/>`,
    );
    const marks = map.marks.map((m) => shape(HEAT_MARKS[m.kind].shape, x(m.x), y(m.y), markR, HEAT_MARKS[m.kind].colour));
    // The design point: its mark, and a ring round it so it stands out of any cell.
    const design = map.design ? [shape('circle', x(map.design.x), y(map.design.y), markR, HEAT_MARKS.design.colour), `<circle cx="${n2(x(map.design.x))}" cy="${n2(y(map.design.y))}" r="${n2(Math.max(7, 2 * markR))}" fill="none" stroke="${HEAT_MARKS.design.colour}" stroke-width="2"/>`] : [];
    return [`<g class="cells">${cells.join('')}</g>`, ...marks, ...design];
  });
}
