// The check report's text outputs from a result, through the one report model.
import type { CheckResult } from '../../src/core/result/check-result.ts';
import { reportDocument } from '../../src/render/model/report-document.ts';
import { renderMarkdown } from '../../src/render/markdown/render-markdown.ts';
import { renderHtml } from '../../src/render/html/render-html.ts';
import type { ReportPlots } from '../../src/render/report-plots.ts';

/** The sample result has neither ride nor plots: nothing to draw. */
export const NO_PLOTS: ReportPlots = new Map();

export function markdownOf(result: CheckResult): string {
  return renderMarkdown(reportDocument(result));
}

export function htmlOf(result: CheckResult, plots: ReportPlots = NO_PLOTS): string {
  return renderHtml(reportDocument(result), plots);
}
