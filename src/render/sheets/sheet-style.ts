import type ExcelJS from 'exceljs';
import { toArgb } from '../severity-palette.ts';

// Layout helpers shared by every sheet of the workbook.

const LINE_HEIGHT_PT = 15;
const MAX_ROW_HEIGHT_PT = 409; // the spreadsheet limit

export function solidFill(hex: string): ExcelJS.Fill {
  return { type: 'pattern', pattern: 'solid', fgColor: { argb: toArgb(hex) } };
}

export function setColumnWidths(ws: ExcelJS.Worksheet, widths: readonly number[]): void {
  ws.columns = widths.map((width) => ({ width }));
}

/**
 * Height for a row whose wrapped cells hold these texts in columns of these
 * widths. Spreadsheets do not grow merged or generated rows to fit, so we do.
 */
export function wrappedHeight(cells: readonly { text: string; width: number }[]): number {
  const lines = Math.max(
    1,
    ...cells.map(({ text, width }) => {
      const perLine = Math.max(1, Math.floor(width * 0.9));
      return text.split('\n').reduce((n, line) => n + Math.max(1, Math.ceil(line.length / perLine)), 0);
    }),
  );
  return Math.min(MAX_ROW_HEIGHT_PT, lines * LINE_HEIGHT_PT);
}

/** A bold, shaded caution line across the first `span` columns. */
export function addCautionRow(ws: ExcelJS.Worksheet, text: string, span: number, totalWidth: number): ExcelJS.Row {
  const row = ws.addRow([text]);
  ws.mergeCells(row.number, 1, row.number, span);
  const cell = row.getCell(1);
  cell.font = { bold: true, color: { argb: toArgb('#7F2704') } };
  cell.fill = solidFill('#FFF2CC');
  cell.alignment = { wrapText: true, vertical: 'middle' };
  row.height = wrappedHeight([{ text, width: totalWidth }]) + 4;
  return row;
}

export function addHeaderRow(ws: ExcelJS.Worksheet, labels: readonly string[]): ExcelJS.Row {
  const row = ws.addRow([...labels]);
  row.eachCell((cell) => {
    cell.font = { bold: true };
    cell.fill = solidFill('#D9D9D9');
    cell.alignment = { wrapText: true, vertical: 'bottom' };
    cell.border = { bottom: { style: 'thin' } };
  });
  return row;
}

export function addHeading(ws: ExcelJS.Worksheet, text: string, size = 13): ExcelJS.Row {
  const row = ws.addRow([text]);
  row.getCell(1).font = { bold: true, size };
  return row;
}

export function sumOf(widths: readonly number[]): number {
  return widths.reduce((a, b) => a + b, 0);
}

/** A line of text merged across the sheet's columns, wrapped, the row tall enough for it. */
export function addMergedLine(ws: ExcelJS.Worksheet, text: string, widths: readonly number[]): ExcelJS.Row {
  const row = ws.addRow([text]);
  ws.mergeCells(row.number, 1, row.number, widths.length);
  row.getCell(1).alignment = { wrapText: true, vertical: 'top' };
  row.height = wrappedHeight([{ text, width: sumOf(widths) }]);
  return row;
}
