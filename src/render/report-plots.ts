// The report's plots: the balance and turn plots the core computed, and the
// ride model's time series. report.md links each as an SVG file written
// beside it (plot-<id>.svg, ride-<case>-<kind>.svg) with its caption;
// report.html puts the same SVG inline in the link's place. Drawing is
// asynchronous (vega), so the plots are drawn once, before either renderer runs.

import type { CheckResult } from '../core/result/check-result.ts';
import { escapeBlock, escapeInline } from './markdown-escape.ts';
import { plotFile, plotSvg } from './plots/plot-svg.ts';
import { ridePlotFiles } from './ride-plots.ts';

/** Heading of the section holding the balance and turn plots. */
export const PLOTS_TITLE = 'Plots';

/** SVG text by the file name report.md links. */
export type ReportPlots = ReadonlyMap<string, string>;

/** Every plot the report links, drawn to SVG. */
export async function drawReportPlots(result: CheckResult): Promise<ReportPlots> {
  const own = await Promise.all((result.plots ?? []).map(async (p): Promise<[string, string]> => [plotFile(p), `${await plotSvg(p)}\n`]));
  const ride = await Promise.all((result.ride?.cases ?? []).map((c) => ridePlotFiles(c.case, c.title, c.plot)));
  return new Map([...own, ...ride.flat()]);
}

/** The balance and turn plots under their own heading, each with its caption. */
export function plotSections(result: CheckResult): string[] {
  const plots = result.plots ?? [];
  if (plots.length === 0) return [];
  return [`## ${PLOTS_TITLE}`, ...plots.flatMap((p) => [`![${escapeInline(p.title)}](${plotFile(p)})`, `*${escapeBlock(p.caption)}*`])];
}
