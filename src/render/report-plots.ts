// The report's plots: the balance and turn plots the core computed, and the
// ride model's time series. report.md links each as an SVG file written
// beside it (plot-<id>.svg, ride-<case>-<kind>.svg); report.html holds the
// same SVG inline. Drawing is asynchronous (vega), so the plots are drawn
// once, before the renderers run, and handed to the HTML renderer by file name.

import type { CheckResult } from '../core/result/check-result.ts';
import { plotFile, plotSvg } from './plots/plot-svg.ts';
import { ridePlotFiles } from './ride-plots.ts';

/** SVG text by the file name report.md links. */
export type ReportPlots = ReadonlyMap<string, string>;

/** Every plot the report links, drawn to SVG. */
export async function drawReportPlots(result: CheckResult): Promise<ReportPlots> {
  const own = await Promise.all((result.plots ?? []).map(async (p): Promise<[string, string]> => [plotFile(p), `${await plotSvg(p)}\n`]));
  const ride = await Promise.all((result.ride?.cases ?? []).map((c) => ridePlotFiles(c.case, c.title, c.plot)));
  return new Map([...own, ...ride.flat()]);
}
