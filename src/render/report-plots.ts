// The report's plots: the balance and turn plots the core computed, and the
// ride model's time series. report.md links each as an SVG file written
// beside it (plot-<id>.svg, ride-<case>-<kind>.svg); report.html holds the
// same SVG inline. Drawn once, before the renderers run, and handed to the
// HTML renderer by file name.

import type { PlotData } from '../core/plots/plot-data.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import { plotFile, plotSvg } from './plots/plot-svg.ts';
import { ridePlotList } from './ride-plots.ts';

/** SVG text by the file name report.md links. */
export type ReportPlots = ReadonlyMap<string, string>;

/** Every plot the report links, with the file name it is written under. */
export function reportPlotList(result: CheckResult): [string, PlotData][] {
  return [...(result.plots ?? []).map((p): [string, PlotData] => [plotFile(p), p]), ...(result.ride?.cases ?? []).flatMap((c) => ridePlotList(c.case, c.title, c.plot))];
}

/** Every plot the report links, drawn to SVG. */
export function drawReportPlots(result: CheckResult): ReportPlots {
  return new Map(reportPlotList(result).map(([file, plot]) => [file, `${plotSvg(plot)}\n`]));
}
