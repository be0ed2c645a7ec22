import type { CheckResult } from '../core/result/check-result.ts';
import { writeFileSet } from './write-file-set.ts';
import { nativeDeflateRaw } from './native-deflate.ts';
import type { PdfPrinter } from './pdf-printer.ts';
import { reportDocument } from '../render/model/report-document.ts';
import { summaryDocument } from '../render/model/summary-document.ts';
import { teachDocument } from '../render/model/teach-document.ts';
import { renderHtml } from '../render/html/render-html.ts';
import { renderMarkdown } from '../render/markdown/render-markdown.ts';
import { renderWorkbook } from '../render/workbook.ts';
import { SETTING_OUT_SVG_FILE, settingOutSvg } from '../render/report-figures.ts';
import { drawReportPlots } from '../render/report-plots.ts';
import { drawingOutputs } from '../render/report-drawings.ts';

export const OUTPUT_FILES = {
  workbook: 'result.xlsx',
  markdown: 'report.md',
  html: 'report.html',
  /** The feasibility summary on its own; report.html opens with the same. */
  summary: 'summary.html',
  json: 'result.json',
  /** The wheel setting-out drawing that report.md links to; report.html holds it inline. */
  settingOut: SETTING_OUT_SVG_FILE,
} as const;

/** Written only when asked for: the teaching view (--teach) and the printed reports (--pdf, where a browser prints them). */
export const OPTIONAL_FILES = {
  teach: 'teach.html',
  reportPdf: 'report.pdf',
  summaryPdf: 'summary.pdf',
} as const;

export interface OutputOptions {
  /** Write the teaching view, teach.html. */
  teach?: boolean;
  /** Print report.html and summary.html to PDF through this printer. */
  printer?: PdfPrinter;
}

export function resultJson(result: CheckResult): string {
  return JSON.stringify(result, null, 2) + '\n';
}

/** Render everything first (the PDFs included), then write each file atomically; returns the paths written. */
export async function writeOutputs(result: CheckResult, dir: string, inputPath: string, options: OutputOptions = {}): Promise<string[]> {
  // One report model for all three outputs, so the workbook, report.md and report.html cannot disagree.
  const doc = reportDocument(result);
  const plots = drawReportPlots(result);
  const workbook = await renderWorkbook(result, doc, nativeDeflateRaw);
  const html = renderHtml(doc, plots);
  const summary = renderHtml(summaryDocument(result), plots);
  const printed: [string, Uint8Array][] = options.printer
    ? [
        [OPTIONAL_FILES.reportPdf, await options.printer.print(html)],
        [OPTIONAL_FILES.summaryPdf, await options.printer.print(summary)],
      ]
    : [];
  const files: [string, string | Uint8Array][] = [
    [OUTPUT_FILES.workbook, workbook],
    [OUTPUT_FILES.markdown, renderMarkdown(doc)],
    [OUTPUT_FILES.html, html],
    [OUTPUT_FILES.summary, summary],
    [OUTPUT_FILES.json, resultJson(result)],
    [OUTPUT_FILES.settingOut, `${settingOutSvg(result).trim()}\n`],
    ...(options.teach ? [[OPTIONAL_FILES.teach, renderHtml(teachDocument(result), plots)] as [string, string]] : []),
    ...printed,
    // The plots report.md links (plot-<id>.svg, ride-<case>-<plot>.svg); report.html holds them inline.
    ...plots,
    // The drawings of the build report.md links (drawing-<id>.svg); report.html holds them inline.
    ...drawingOutputs(result),
  ];
  return writeFileSet(dir, files, inputPath);
}
