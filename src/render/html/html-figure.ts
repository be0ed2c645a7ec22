import type { FigureBlock } from '../model/document.ts';
import type { ReportPlots } from '../report-plots.ts';
import { inlineSvg } from '../inline-svg.ts';
import { escapeHtml } from './html-escape.ts';

// A figure goes inline as its SVG: the model's own (drawings, the setting-out,
// stock bars) or the plot drawn for its file. inlineSvg refuses anything active
// or external and scopes each drawing's style sheet to the drawing itself.

function missing(f: FigureBlock): string {
  return `<p><em>${escapeHtml(`The figure "${f.title}" could not be placed inline; see ${f.file ?? 'the Markdown report'} beside report.md.`)}</em></p>`;
}

function stripsHtml(f: FigureBlock, strips: NonNullable<FigureBlock['strips']>): string {
  const rows = strips.map((s) => {
    const svg = inlineSvg(s.svg);
    return `<figure><figcaption>${escapeHtml(s.caption)}</figcaption>${svg ?? missing(f)}</figure>`;
  });
  return `<div class="${f.role}">\n${rows.join('\n')}\n</div>`;
}

export function figureHtml(f: FigureBlock, plots: ReportPlots): string {
  if (f.strips) return stripsHtml(f, f.strips);
  const source = f.svg ?? (f.file === undefined ? undefined : plots.get(f.file));
  const svg = source === undefined ? null : inlineSvg(source);
  if (svg === null) return missing(f);
  const caption = f.caption ? `<figcaption>${escapeHtml(f.caption)}</figcaption>` : '';
  return `<figure class="${f.role}">${svg}${caption}</figure>`;
}
