import { esc } from '../drawings/svg-sheet.ts';
import { textWidth } from '../drawings/text-box.ts';
import { linear, tickText, ticksWithin, type Domain } from './chart-scale.ts';
import { chartText, legendLayout, n2, type LegendEntry } from './chart-legend.ts';

// What every chart of ours shares around its marks: a white ground, the title
// at the top left, the plot area framed, its axes with nice ticks and their
// titles, light grid lines where asked, the key below, and room on the right
// for a colour bar. SVG text written directly (no DOM, no library): the same
// chart gives the same bytes, and nothing in it needs an id.

export interface ChartSpec {
  title: string;
  /** The plot area, px. */
  size: { width: number; height: number };
  x: Domain;
  y: Domain;
  xLabel: string;
  yLabel: string;
  grid: boolean;
  legend: readonly LegendEntry[];
  legendColumns: number;
  /** Something right of the plot area (a colour bar): its width, and its drawing with its left edge at x. */
  right?: { width: number; draw(x: number, height: number): string };
}

/** Paper position of a value in the plot area, its origin at the area's top left. */
export interface ChartAxes {
  x: (v: number) => number;
  y: (v: number) => number;
}

const TITLE_FONT = 13;
const AXIS_FONT = 11;
const TICK = 4;
const PAD = 6;
const FRAME = '#444444';
const GRID = '#e4e4e4';

/** The chart as SVG text, with `marks` drawn in the plot area's own coordinates. */
export function chartSvg(spec: ChartSpec, marks: (axes: ChartAxes) => string[]): string {
  const { width: W, height: H } = spec.size;
  const xTicks = ticksWithin(spec.x, Math.max(2, Math.round(W / 80)));
  const yTicks = ticksWithin(spec.y, Math.max(2, Math.round(H / 30)));
  const x = linear(spec.x, [0, W]);
  const y = linear(spec.y, [H, 0]);
  const xText = xTicks.values.map((v) => tickText(v, xTicks.decimals));
  const yText = yTicks.values.map((v) => tickText(v, yTicks.decimals));
  const width = (t: string, size = AXIS_FONT) => textWidth(t, { size });
  const yTickWidth = Math.max(0, ...yText.map((t) => width(t)));
  // Room left for the y ticks and the y title (turned upright), and for half the first x tick's text.
  const halfFirst = xText.length ? width(xText[0]) / 2 - x(xTicks.values[0]) : 0;
  const left = Math.ceil(Math.max(PAD + AXIS_FONT * 1.3 + PAD + yTickWidth + TICK + 2, halfFirst + PAD));
  const top = Math.ceil(PAD + TITLE_FONT * 1.25 + 8);
  const halfLast = xText.length ? width(xText[xText.length - 1]) / 2 - (W - x(xTicks.values[xTicks.values.length - 1])) : 0;
  const rightRoom = spec.right ? spec.right.width + 2 * PAD : 0;
  const legend = legendLayout(spec.legend, Math.max(W, 1), spec.legendColumns);
  const inner = Math.max(W + rightRoom, legend.width, width(spec.title, TITLE_FONT), width(spec.xLabel) / 2 + W / 2);
  const svgWidth = Math.ceil(left + inner + Math.max(PAD, halfLast + 2));
  const axisBottom = H + TICK + 2 + AXIS_FONT * 1.2 + 6 + AXIS_FONT * 1.25;
  const svgHeight = Math.ceil(top + axisBottom + (legend.height ? 12 + legend.height : 0) + PAD);

  const parts: string[] = [];
  // Grid, ticks and their numbers, then the frame over the grid's ends.
  xTicks.values.forEach((v, i) => {
    const px = n2(x(v));
    if (spec.grid) parts.push(`<line x1="${px}" y1="0" x2="${px}" y2="${H}" stroke="${GRID}"/>`);
    parts.push(`<line x1="${px}" y1="${H}" x2="${px}" y2="${H + TICK}" stroke="${FRAME}"/>`, chartText(x(v), H + TICK + 2 + AXIS_FONT, xText[i], AXIS_FONT, 'middle'));
  });
  yTicks.values.forEach((v, i) => {
    const py = n2(y(v));
    if (spec.grid) parts.push(`<line x1="0" y1="${py}" x2="${W}" y2="${py}" stroke="${GRID}"/>`);
    parts.push(`<line x1="${-TICK}" y1="${py}" x2="0" y2="${py}" stroke="${FRAME}"/>`, chartText(-TICK - 2, y(v) + AXIS_FONT * 0.35, yText[i], AXIS_FONT, 'end'));
  });
  parts.push(chartText(W / 2, H + TICK + 2 + AXIS_FONT * 1.2 + 6 + AXIS_FONT, spec.xLabel, AXIS_FONT, 'middle', ' class="axis-title"'));
  const yTitleX = -(TICK + 2 + yTickWidth + PAD + AXIS_FONT * 0.3);
  parts.push(chartText(0, 0, spec.yLabel, AXIS_FONT, 'middle', ` class="axis-title" transform="translate(${n2(yTitleX)},${n2(H / 2)}) rotate(-90)"`));
  parts.push(...marks({ x, y }));
  parts.push(`<rect x="0" y="0" width="${W}" height="${H}" fill="none" stroke="${FRAME}"/>`);
  if (spec.right) parts.push(spec.right.draw(W + 2 * PAD, H));
  if (legend.height) parts.push(legend.draw(0, axisBottom + 12));

  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" width="${svgWidth}" height="${svgHeight}" viewBox="0 0 ${svgWidth} ${svgHeight}" font-family="sans-serif" role="img" aria-label="${esc(spec.title)}">`,
    `<title>${esc(spec.title)}</title>`,
    `<rect width="${svgWidth}" height="${svgHeight}" fill="#ffffff"/>`,
    chartText(left, PAD + TITLE_FONT, spec.title, TITLE_FONT, 'start', ' class="title"'),
    `<g transform="translate(${left},${top})">${parts.join('')}</g>`,
    '</svg>',
  ].join('');
}
