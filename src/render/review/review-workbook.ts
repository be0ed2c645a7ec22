import ExcelJS from 'exceljs';
import type { ReviewTable } from '../../core/review/review-table.ts';
import { addCautionRow, addHeading, addMergedLine, font, setColumnWidths, styleCaution, sumOf, wrappedHeight } from '../sheets/sheet-style.ts';
import { addModelTable, tableWidths } from '../sheets/sheet-table.ts';
import { setPrint } from '../sheets/print-setup.ts';
import { filterFrom } from '../sheets/report-sheet.ts';
import { steadyWorkbookBytes } from '../steady-bytes.ts';
import { toArgb } from '../severity-palette.ts';
import { SHORT_CAUTION } from '../../core/cautions.ts';
import { reviewCautions } from './review-cautions.ts';
import { relativeHref } from './review-html.ts';
import { REPORT_COLUMN, reviewTableBlock } from './review-table-block.ts';

// The review table as a workbook of one sheet: the caution line and the
// cautions in full, the table with a filter on its header (numbers raw, each
// column's unit in its header) and a link to each full report, then the notes.
// The same review always gives the same bytes.

/** The widest a review column is fitted: the findings and inputs columns wrap beyond it. */
const MAX_WIDTH = 48;
/** A link's ink: the blue a reader knows a link by. */
const LINK_INK = '#1F4E79';

export async function reviewWorkbook(review: ReviewTable): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  wb.creator = `${review.tool.name} ${review.tool.version}`;
  wb.title = `Review of ${review.rows.length} proposal${review.rows.length === 1 ? '' : 's'}`;
  const t = reviewTableBlock(review.rows);
  const ws = wb.addWorksheet('Review');
  const widths = tableWidths([t], { maxWidth: MAX_WIDTH });
  setColumnWidths(ws, widths);
  addCautionRow(ws, SHORT_CAUTION, widths.length, sumOf(widths));
  ws.addRow([]);
  const title = addMergedLine(ws, wb.title, widths);
  title.getCell(1).font = font({ bold: true, size: 16 });
  for (const caution of reviewCautions(review)) {
    const line = addMergedLine(ws, caution, widths);
    styleCaution(line.getCell(1));
    line.height = wrappedHeight([{ text: caution, width: sumOf(widths) * 0.9 }]) + 4;
  }
  ws.addRow([]);
  const header = addModelTable(ws, t, widths, { maxWidth: MAX_WIDTH });
  review.rows.forEach((r, i) => {
    if (r.report === null) return;
    const cell = ws.getRow(header.number + 1 + i).getCell(REPORT_COLUMN + 1);
    cell.value = { text: r.report, hyperlink: relativeHref(r.report) };
    cell.font = font({ underline: true, color: { argb: toArgb(LINK_INK) } });
  });
  if (t.rows.length) filterFrom(ws, header, widths.length);
  ws.addRow([]);
  addHeading(ws, 'Notes');
  for (const note of review.notes) addMergedLine(ws, note, widths);
  setPrint(ws, { titleRows: header.number });
  return steadyWorkbookBytes(wb);
}
