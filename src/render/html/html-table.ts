import type { Cell, Column, TableBlock } from '../model/document.ts';
import { cellText, headerText } from '../model/cell-text.ts';
import { anchorId, escapeHtml } from './html-escape.ts';
import { badgeHtml, runsHtml, SOURCE_ANCHOR } from './html-runs.ts';

function cellHtml(cell: Cell, column: Column): string {
  if (cell.kind === 'severity') return badgeHtml(cell.severity);
  if (cell.kind === 'text' && cell.runs) return runsHtml(cell.runs);
  const text = escapeHtml(cellText(cell, column));
  if (cell.kind === 'text' && cell.mark) return cell.mark === 'em' ? `<em>${text}</em>` : `<strong>${text}</strong>`;
  return text;
}

const numClass = (c: Column) => (c.align === 'right' ? ' class="num"' : '');

/** A model table as an HTML table, without the columns only the workbook shows; its empty text where it has no rows. */
export function tableHtml(t: TableBlock): string {
  if (t.rows.length === 0) return `<p>${escapeHtml(t.empty)}</p>`;
  const shown = t.columns.map((c, i) => ({ c, i })).filter(({ c }) => c.only !== 'sheet');
  const head = shown.map(({ c }) => `<th${numClass(c)}>${escapeHtml(headerText(c))}</th>`).join('');
  const body = t.rows.map((r) => {
    const classes = [r.total ? 'total' : '', r.muted ? 'muted' : ''].filter(Boolean);
    const attrs = `${r.anchor ? ` id="${anchorId(SOURCE_ANCHOR, r.anchor)}"` : ''}${classes.length ? ` class="${classes.join(' ')}"` : ''}`;
    // A group's title stands on a row of its own, a header cell across the table (no data cell, so it is not a row of the table's data).
    const group = r.group === undefined ? '' : `<tr class="group"><th colspan="${shown.length}" scope="rowgroup">${escapeHtml(r.group)}</th></tr>\n`;
    return `${group}<tr${attrs}>${shown.map(({ c, i }) => `<td${numClass(c)}>${cellHtml(r.cells[i], c)}</td>`).join('')}</tr>`;
  });
  return `<table class="${escapeHtml(t.id)}">\n<thead><tr>${head}</tr></thead>\n<tbody>\n${body.join('\n')}\n</tbody>\n</table>`;
}
