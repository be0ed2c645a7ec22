import type { CheckResult } from '../core/result/check-result.ts';
import { writeFileSet } from './write-file-set.ts';
import { reportDocument } from '../render/model/report-document.ts';
import { renderHtml } from '../render/html/render-html.ts';
import { renderMarkdown } from '../render/markdown/render-markdown.ts';
import { renderWorkbook } from '../render/workbook.ts';
import { SETTING_OUT_SVG_FILE, settingOutSvg } from '../render/report-figures.ts';
import { drawHere, drawReportPlots, type PlotDrawer } from '../render/report-plots.ts';
import { drawingOutputs } from '../render/report-drawings.ts';

export const OUTPUT_FILES = {
  workbook: 'result.xlsx',
  markdown: 'report.md',
  html: 'report.html',
  json: 'result.json',
  /** The wheel setting-out drawing that report.md links to; report.html holds it inline. */
  settingOut: SETTING_OUT_SVG_FILE,
} as const;

export function resultJson(result: CheckResult): string {
  return JSON.stringify(result, null, 2) + '\n';
}

/** Render everything first, then write each file atomically; returns the paths written. */
export async function writeOutputs(result: CheckResult, dir: string, inputPath: string, draw: PlotDrawer = drawHere): Promise<string[]> {
  // One report model for all three outputs, so the workbook, report.md and report.html cannot disagree.
  const doc = reportDocument(result);
  // The plots are drawn (perhaps in another thread) while the workbook is made.
  const [plots, workbook] = await Promise.all([drawReportPlots(result, draw), renderWorkbook(result, doc)]);
  const files: [string, string | Uint8Array][] = [
    [OUTPUT_FILES.workbook, workbook],
    [OUTPUT_FILES.markdown, renderMarkdown(doc)],
    [OUTPUT_FILES.html, renderHtml(doc, plots)],
    [OUTPUT_FILES.json, resultJson(result)],
    [OUTPUT_FILES.settingOut, `${settingOutSvg(result).trim()}\n`],
    // The plots report.md links (plot-<id>.svg, ride-<case>-<plot>.svg); report.html holds them inline.
    ...plots,
    // The drawings of the build report.md links (drawing-<id>.svg); report.html holds them inline.
    ...drawingOutputs(result),
  ];
  return writeFileSet(dir, files, inputPath);
}
