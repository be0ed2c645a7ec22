import type { PlotData } from '../../core/plots/plot-data.ts';
import { plotSpec } from './plot-spec.ts';

/** The plot as a stand-alone SVG file's text, ready to go inline in the report. */
export async function plotSvg(plot: PlotData): Promise<string> {
  // vega loads on the first plot, not with the command: a run that draws none never pays for it.
  const { vegaLiteSvg } = await import('./vega-svg.mjs');
  return vegaLiteSvg(plotSpec(plot));
}

/** File name of a plot written beside report.md. */
export function plotFile(plot: Pick<PlotData, 'id'>): string {
  return `plot-${plot.id}.svg`;
}
