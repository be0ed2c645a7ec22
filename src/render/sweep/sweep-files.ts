import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { renderHtml } from '../html/render-html.ts';
import { renderMarkdown } from '../markdown/render-markdown.ts';
import { sweepCsv } from './sweep-csv.ts';
import { sweepDocument } from './sweep-document.ts';
import { sweepJson } from './sweep-json.ts';
import { SWEEP_PLOT_FILE } from './sweep-plot.ts';

/** Every file of a sweep's output set, rendered; `plot` is the picture drawn (sweepPlotSpec), where there is one. */
export function sweepFiles(r: SweepResult, plot: { svg: string; caption: string } | null): [string, string][] {
  const doc = sweepDocument(r, plot?.caption ?? null);
  const plots = new Map(plot ? [[SWEEP_PLOT_FILE, plot.svg]] : []);
  return [
    ['sweep.csv', sweepCsv(r)],
    ['sweep.json', sweepJson(r)],
    ['sweep.md', renderMarkdown(doc)],
    ['sweep.html', renderHtml(doc, plots)],
    ...(plot ? [[SWEEP_PLOT_FILE, `${plot.svg}\n`] as [string, string]] : []),
  ];
}
