import type { PlotData } from '../../core/plots/plot-data.ts';
import { chartSvg } from './chart-frame.ts';
import { dashAttr, n2, strokeSymbol, symbolCentre, type LegendEntry } from './chart-legend.ts';
import { xDomain, yDomain } from './plot-domains.ts';
import { cycle, DASHED, RULE_COLOURS, RULE_DASH, SERIES_COLOURS, SERIES_DASHES } from './series-style.ts';
import { thinPoints } from './thin-points.ts';

// PlotData as a chart: its lines, its marked points and its reference lines
// over one pair of axes, with one key in the order of the lines, then the
// reference lines (series-style.ts gives each a colour and a dash together).

export const PLOT_WIDTH = 600;
export const PLOT_HEIGHT = 240;
const LINE_WIDTH = 1.6;
const RULE_WIDTH = 1.3;
/** A marked point's radius, px. */
const DOT = 4.4;

/** How each line and reference line is drawn, in the order of the key. */
export function plotStyles(plot: PlotData): { label: string; colour: string; dash: readonly number[]; dots: boolean }[] {
  const nth = plot.rules.map((r, i) => plot.rules.slice(0, i).filter((q) => q.kind === r.kind).length);
  return [
    ...plot.lines.map((l, i) => ({ label: l.label, colour: cycle(SERIES_COLOURS, i), dash: l.style === 'dashed' ? DASHED : l.style === 'dots' ? [] : cycle(SERIES_DASHES, i), dots: l.style === 'dots' })),
    ...plot.rules.map((r, i) => ({ label: r.label, colour: cycle(RULE_COLOURS[r.kind], nth[i]), dash: cycle(RULE_DASH[r.kind], nth[i]), dots: false })),
  ];
}

/** The plot as a stand-alone SVG file's text, ready to go inline in the report. */
export function plotSvg(given: PlotData, size = { width: PLOT_WIDTH, height: PLOT_HEIGHT }): string {
  // A reference line with no value has no place on the axis: it is left out (no NaN reaches the file).
  const plot = { ...given, rules: given.rules.filter((r) => Number.isFinite(r.value)) };
  const styles = plotStyles(plot);
  const legend: LegendEntry[] = styles.map((s) => ({
    label: s.label,
    symbol: s.dots ? (x, y) => `<circle cx="${n2(symbolCentre(x))}" cy="${n2(y)}" r="${DOT}" fill="${s.colour}"/>` : strokeSymbol(s.colour, s.dash),
  }));
  const spec = { title: plot.title, size, x: xDomain(plot, Math.max(2, Math.round(size.width / 80))), y: yDomain(plot), xLabel: plot.xLabel, yLabel: plot.yLabel, grid: true, legend, legendColumns: 2 };
  return chartSvg(spec, ({ x, y }) => {
    const lines: string[] = [];
    const dots: string[] = [];
    plot.lines.forEach((l, i) => {
      const s = styles[i];
      if (s.dots) {
        l.x.forEach((px, k) => {
          if (Number.isFinite(px) && Number.isFinite(l.y[k])) dots.push(`<circle cx="${n2(x(px))}" cy="${n2(y(l.y[k]))}" r="${DOT}" fill="${s.colour}"/>`);
        });
        return;
      }
      const pts = thinPoints(l.x, l.y, size.width / 2);
      if (pts.length < 2) return;
      const d = pts.map(([px, py], k) => `${k ? 'L' : 'M'}${n2(x(px))},${n2(y(py))}`).join('');
      lines.push(`<path class="line" d="${d}" fill="none" stroke="${s.colour}" stroke-width="${LINE_WIDTH}" stroke-linejoin="round"${dashAttr(s.dash)}/>`);
    });
    const rules = plot.rules.map((r, j) => {
      const s = styles[plot.lines.length + j];
      const ends = r.axis === 'y' ? [0, y(r.value), size.width, y(r.value)] : [x(r.value), 0, x(r.value), size.height];
      return `<line class="rule" x1="${n2(ends[0])}" y1="${n2(ends[1])}" x2="${n2(ends[2])}" y2="${n2(ends[3])}" stroke="${s.colour}" stroke-width="${RULE_WIDTH}"${dashAttr(s.dash)}/>`;
    });
    // Lines first, the reference lines over them, the marked points on top.
    return [...lines, ...rules, ...dots];
  });
}

/** File name of a plot written beside report.md. */
export function plotFile(plot: Pick<PlotData, 'id'>): string {
  return `plot-${plot.id}.svg`;
}
