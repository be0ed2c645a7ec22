import { SHORT_CAUTION } from '../../core/cautions.ts';
import type { ReviewTable } from '../../core/review/review-table.ts';
import type { Cell, Column } from '../model/document.ts';
import { cellText, headerText } from '../model/cell-text.ts';
import { escapeHtml } from '../html/html-escape.ts';
import { badgeHtml } from '../html/html-runs.ts';
import { REPORT_CSS } from '../html/report-style.ts';
import { htmlPage } from '../html/html-page.ts';
import { reviewCautions } from './review-cautions.ts';
import { REPORT_COLUMN, reviewTableBlock } from './review-table-block.ts';

// The review table as one self-contained HTML file in the report's style:
// the cautions first, then a row per proposal whose last cell links its full
// report (a relative link, so the folder can be moved whole), then the notes.

/** Wider than a report: the table has many columns. */
const REVIEW_CSS = `${REPORT_CSS}
body { max-width: 110em; }
table.review td { vertical-align: top; }`;

/** A path relative to this file as a link target: each part encoded, so no name can break out of it. */
export function relativeHref(path: string): string {
  return path.split('/').map(encodeURIComponent).join('/');
}

function cellHtml(cell: Cell, column: Column, columnIndex: number): string {
  if (cell.kind === 'severity') return badgeHtml(cell.severity);
  const text = cellText(cell, column);
  if (columnIndex === REPORT_COLUMN && text !== '') return `<a href="${escapeHtml(relativeHref(text))}">${escapeHtml(text)}</a>`;
  const html = text.split('\n').map(escapeHtml).join('<br>');
  return cell.kind === 'text' && cell.mark === 'strong' ? `<strong>${html}</strong>` : html;
}

export function reviewHtml(review: ReviewTable): string {
  const t = reviewTableBlock(review.rows);
  const num = (c: Column) => (c.align === 'right' ? ' class="num"' : '');
  const head = t.columns.map((c) => `<th${num(c)}>${escapeHtml(headerText(c))}</th>`).join('');
  const body = t.rows.map((r) => `<tr>${r.cells.map((cell, i) => `<td${num(t.columns[i])}>${cellHtml(cell, t.columns[i], i)}</td>`).join('')}</tr>`);
  const table = t.rows.length ? `<table class="review">\n<thead><tr>${head}</tr></thead>\n<tbody>\n${body.join('\n')}\n</tbody>\n</table>` : `<p>${escapeHtml(t.empty)}</p>`;
  const title = `Review of ${review.rows.length} proposal${review.rows.length === 1 ? '' : 's'}`;
  const list = (cls: string, items: readonly string[]) => `<ul${cls ? ` class="${cls}"` : ''}>\n${items.map((i) => `<li>${escapeHtml(i)}</li>`).join('\n')}\n</ul>`;
  const lede = `One row per proposal checked by ${review.tool.name} ${review.tool.version}: its verdict, worst findings, the inputs the verdict hangs on, cost and mass; the last column opens its full report.`;
  return htmlPage(
    title,
    REVIEW_CSS,
    `<p class="lede">${escapeHtml(lede)}</p>
<h2 class="cautions">Cautions</h2>
${list('cautions', reviewCautions(review))}
<h2>Proposals</h2>
${table}
<h2>Notes</h2>
${list('', review.notes)}
<hr>
<p><em>${escapeHtml(SHORT_CAUTION)}</em></p>
`,
  );
}