import type ExcelJS from 'exceljs';
import { SEVERITY_COLOURS, SEVERITY_MARKS, toArgb } from '../severity-palette.ts';
import type { Severity } from '../../core/findings/finding.ts';
import { CAUTION_FILL, CAUTION_INK, HEADER_FILL } from './sheet-palette.ts';

// Layout helpers shared by every sheet of the workbook.

const LINE_HEIGHT_PT = 15;
const MAX_ROW_HEIGHT_PT = 409; // the spreadsheet limit
/**
 * Characters of running text a column width unit holds: a unit is a digit's
 * width and most letters are narrower. Measured on a printed sheet with a
 * wide substitute font, with a tenth left for words that do not fill a line.
 */
const CHARS_PER_UNIT = 1.1;
/** The body font every cell is set in; cells given a font of their own keep it. */
export const BODY_FONT = 'Calibri';

/** A font in the body face: bold, italic, size and colour as asked. */
export function font(o: Partial<ExcelJS.Font> = {}): Partial<ExcelJS.Font> {
  return { name: BODY_FONT, family: 2, size: 11, ...o };
}

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
      const perLine = Math.max(1, Math.floor(width * CHARS_PER_UNIT));
      return text.split('\n').reduce((n, line) => n + Math.max(1, Math.ceil(line.length / perLine)), 0);
    }),
  );
  return Math.min(MAX_ROW_HEIGHT_PT, lines * LINE_HEIGHT_PT);
}

/** Bold deep-brown ink on a pale sand fill, ruled below: the look of every caution. */
export function styleCaution(cell: ExcelJS.Cell, size?: number): void {
  cell.font = font({ bold: true, color: { argb: toArgb(CAUTION_INK) }, ...(size ? { size } : {}) });
  cell.fill = solidFill(CAUTION_FILL);
  cell.border = { bottom: { style: 'medium', color: { argb: toArgb(CAUTION_INK) } } };
}

/** A bold, shaded caution line across the first `span` columns. */
export function addCautionRow(ws: ExcelJS.Worksheet, text: string, span: number, totalWidth: number): ExcelJS.Row {
  const row = ws.addRow([text]);
  ws.mergeCells(row.number, 1, row.number, span);
  const cell = row.getCell(1);
  styleCaution(cell);
  cell.alignment = { wrapText: true, vertical: 'middle' };
  row.height = wrappedHeight([{ text, width: totalWidth }]) + 4;
  return row;
}

/** A table header cell: bold on a cool grey, ruled below. */
export function styleHeader(cell: ExcelJS.Cell): void {
  cell.font = font({ bold: true });
  cell.fill = solidFill(HEADER_FILL);
  cell.alignment = { wrapText: true, vertical: 'bottom' };
  cell.border = { bottom: { style: 'thin' } };
}

/**
 * A severity cell: the word stays the cell's value (so it filters and reads
 * back as the word), its number format writes the mark before it, and the
 * fill and ink are the severity's own.
 */
export function styleSeverity(cell: ExcelJS.Cell, s: Severity, size?: number): void {
  const { fill, text } = SEVERITY_COLOURS[s];
  cell.fill = solidFill(fill);
  cell.font = font({ bold: true, color: { argb: toArgb(text) }, ...(size ? { size } : {}) });
  cell.numFmt = severityFormat(s);
}

/** The text format that puts a severity's mark before the word. */
export function severityFormat(s: Severity): string {
  return `"${SEVERITY_MARKS[s]} "@`;
}

export function addHeaderRow(ws: ExcelJS.Worksheet, labels: readonly string[]): ExcelJS.Row {
  const row = ws.addRow([...labels]);
  row.eachCell((cell) => {
    styleHeader(cell);
  });
  return row;
}

export function addHeading(ws: ExcelJS.Worksheet, text: string, size = 13): ExcelJS.Row {
  const row = ws.addRow([text]);
  row.getCell(1).font = font({ bold: true, size });
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
