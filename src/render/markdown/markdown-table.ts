import type { Cell, Column, TableBlock } from '../model/document.ts';
import { cellText, headerText } from '../model/cell-text.ts';
import { escapeBlock, escapeInline, table } from './markdown-escape.ts';
import { severityMark } from './markdown-runs.ts';

function cellMd(cell: Cell, column: Column, total: boolean): string {
  if (cell.kind === 'severity') return severityMark(cell.severity);
  const text = escapeInline(cellText(cell, column));
  if (text === '') return '';
  const mark = cell.kind === 'text' && cell.mark === 'em' ? '*' : total || (cell.kind === 'text' && cell.mark === 'strong') ? '**' : '';
  return `${mark}${text}${mark}`;
}

/** A model table as a Markdown table, without the columns only the workbook shows; its empty text where it has no rows. */
export function tableMd(t: TableBlock): string {
  if (t.rows.length === 0) return escapeBlock(t.empty);
  const shown = t.columns.map((c, i) => ({ c, i })).filter(({ c }) => c.only !== 'sheet');
  const header = shown.map(({ c }) => escapeInline(headerText(c)));
  const rows = t.rows.map((r) => shown.map(({ c, i }) => cellMd(r.cells[i], c, r.total === true)));
  return table(header, rows, shown.map(({ c }) => (c.align === 'right' ? 'r' : 'l')));
}
