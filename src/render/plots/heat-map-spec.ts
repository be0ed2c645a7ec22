// A heat map as a vega-lite chart: a value over two axes, one cell per grid
// point (or one dot per point where the points are scattered), with marks of
// their own on the points of a kind (the failing points of a sweep) and one
// marked point (the design point). Pure: the chart is data; vega-svg.mjs draws it.

import type { TopLevelSpec } from 'vega-lite';
import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { SERIES_COLOURS } from './series-style.ts';
import { chartFrame } from './chart-frame.ts';

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

/** Each kind of marked point: its legend text, shape and colour (the severity colours of the reports). */
const MARKS: Record<HeatMark['kind'] | 'design', { label: string; shape: string; colour: string }> = {
  fail: { label: 'fails', shape: 'square', colour: SEVERITY_COLOURS.fail.fill },
  warning: { label: 'warning', shape: 'triangle-up', colour: SEVERITY_COLOURS.warning.fill },
  refused: { label: 'spec refused', shape: 'cross', colour: '#3D3D3D' },
  error: { label: 'a rule could not run', shape: 'diamond', colour: SEVERITY_COLOURS.error.fill },
  design: { label: 'design point', shape: 'circle', colour: '#000000' },
};
/** Where no value is given at a point (a refused point, a figure that does not apply). */
const NO_VALUE = '#D9D9D9';
const LOW = '#F1F6FA';

export function heatMapSpec(map: HeatMap, size = { width: HEAT_WIDTH, height: HEAT_HEIGHT }): TopLevelSpec {
  const xs = map.cells.flatMap((c) => [c.x0, c.x1]);
  const ys = map.cells.flatMap((c) => [c.y0, c.y1]);
  const domain = (v: number[]): [number, number] => (v.length ? [Math.min(...v), Math.max(...v)] : [0, 1]);
  const x = { field: 'x', type: 'quantitative', title: map.xLabel, scale: { domain: domain(xs), nice: false, zero: false } } as const;
  const y = { field: 'y', type: 'quantitative', title: map.yLabel, scale: { domain: domain(ys), nice: false, zero: false } } as const;
  const cellW = map.cells.length ? (size.width * (map.cells[0].x1 - map.cells[0].x0)) / (domain(xs)[1] - domain(xs)[0] || 1) : 10;
  const cellH = map.cells.length ? (size.height * (map.cells[0].y1 - map.cells[0].y0)) / (domain(ys)[1] - domain(ys)[0] || 1) : 10;
  const markSize = map.scatter ? 30 : Math.max(6, Math.min(80, 0.35 * cellW * cellH));
  const valued = map.cells.filter((c) => c.value !== null);
  const empty = map.cells.filter((c) => c.value === null);
  const colour = { field: 'value', type: 'quantitative', title: map.valueLabel, scale: { range: [LOW, SERIES_COLOURS[0]] }, legend: { orient: 'right', gradientLength: size.height * 0.6, titleLimit: 0, titleOrient: 'left' } } as const;
  const cellRows = (cells: HeatCell[]) => cells.map((c) => ({ x: c.x0, x2: c.x1, y: c.y0, y2: c.y1, cx: (c.x0 + c.x1) / 2, cy: (c.y0 + c.y1) / 2, value: c.value }));
  const kinds = (['fail', 'warning', 'refused', 'error', 'design'] as const).filter((k) => (k === 'design' ? map.design !== null : map.marks.some((m) => m.kind === k)));
  const markRows = [...map.marks.map((m) => ({ x: m.x, y: m.y, label: MARKS[m.kind].label })), ...(map.design ? [{ ...map.design, label: MARKS.design.label }] : [])];
  // One legend for the marked points: shape and colour by the same labels.
  const legend = { orient: 'bottom', direction: 'horizontal', title: 'points' } as const;
  const labels = kinds.map((k) => MARKS[k].label);
  const shape = { field: 'label', type: 'nominal', scale: { domain: labels, range: kinds.map((k) => MARKS[k].shape) }, legend } as const;
  const colourOfMark = { field: 'label', type: 'nominal', scale: { domain: labels, range: kinds.map((k) => MARKS[k].colour) }, legend } as const;
  const at = { x: { ...x, field: 'cx' }, y: { ...y, field: 'cy' } };
  const layers = [
    valued.length &&
      (map.scatter
        ? { data: { values: cellRows(valued) }, mark: { type: 'point', filled: true, size: 70, opacity: 1 }, encoding: { ...at, color: colour } }
        : { data: { values: cellRows(valued) }, mark: { type: 'rect' }, encoding: { x, x2: { field: 'x2' }, y, y2: { field: 'y2' }, color: colour } }),
    empty.length &&
      (map.scatter
        ? { data: { values: cellRows(empty) }, mark: { type: 'point', filled: true, size: 70, color: NO_VALUE }, encoding: at }
        : { data: { values: cellRows(empty) }, mark: { type: 'rect', color: NO_VALUE }, encoding: { x, x2: { field: 'x2' }, y, y2: { field: 'y2' } } }),
    markRows.length && { data: { values: markRows }, mark: { type: 'point', filled: true, opacity: 1, size: markSize }, encoding: { x, y, shape, fill: colourOfMark } },
    // A ring round the design point, so it stands out of any cell; no legend of its own.
    map.design && { data: { values: [map.design] }, mark: { type: 'point', shape: 'circle', filled: false, color: MARKS.design.colour, strokeWidth: 2, size: Math.max(160, markSize * 4), opacity: 1 }, encoding: { x, y } },
  ].filter(Boolean);
  return {
    ...chartFrame(map.title, size, { axis: { grid: false }, legend: { labelFontSize: 11, titleFontSize: 11 } }),
    layer: layers,
  } as TopLevelSpec;
}
