import type ExcelJS from 'exceljs';
import type { Cell, Column, Row, TableBlock } from '../model/document.ts';
import { cellText, headerText } from '../model/cell-text.ts';
import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { cellNumber, numFmtForUnit, PERCENT_FORMAT } from './cell-format.ts';
import { addHeaderRow, solidFill, wrappedHeight } from './sheet-style.ts';

// A table of the report model written to a worksheet: the same columns and
// rows as the Markdown and HTML tables, with the workbook-only columns too.
// Numbers stay raw, with a number format by unit; a dims cell (L x W x T)
// gives each length a column of its own, unless the sheet asks to join them.

export interface SheetCell {
  value: ExcelJS.CellValue;
  numFmt?: string;
  /** A severity's colour; the word is written too and set in bold. */
  fill?: string;
}

interface SheetColumn {
  header: string;
  cell: (r: Row) => SheetCell;
  /** The text a reader sees, for sizing the column. */
  text: (r: Row) => string;
}

function single(cell: Cell, column: Column): SheetCell {
  switch (cell.kind) {
    case 'text':
      return { value: cell.text === '' ? null : cell.text };
    case 'number':
      if (cell.value === null) return { value: cell.none ?? null };
      return { value: cellNumber(cell.value), numFmt: numFmtForUnit(cell.unit) };
    case 'percent':
      return { value: cellNumber(cell.value), numFmt: PERCENT_FORMAT };
    case 'dims':
      return { value: cellText(cell, column) };
    case 'severity':
      return { value: cell.severity, fill: SEVERITY_COLOURS[cell.severity].fill };
  }
}

function dimsPart(cell: Cell, k: number, column: Column): SheetCell {
  if (cell.kind === 'dims') return { value: cell.values[k], numFmt: numFmtForUnit(cell.unit) };
  return k === 0 ? single(cell, column) : { value: null };
}

/** The sheet's columns for a model table, every one shown, dims split unless joined. */
function sheetColumns(t: TableBlock, joinDims: boolean): SheetColumn[] {
  return t.columns.flatMap((c, i): SheetColumn[] => {
    const text = (r: Row) => cellText(r.cells[i], c);
    if (!c.parts || joinDims) return [{ header: headerText(c), cell: (r) => single(r.cells[i], c), text }];
    return c.parts.map((part, k) => ({ header: headerText({ ...c, parts: [part] }), cell: (r) => dimsPart(r.cells[i], k, c), text: (r) => text(r).split(' x ')[k] ?? '' }));
  });
}

/** A table's header labels as the sheet writes them. */
export function sheetHeaders(t: TableBlock, joinDims = false): string[] {
  return sheetColumns(t, joinDims).map((c) => c.header);
}

/** A row's cells as the sheet writes them: raw values with their number formats. */
export function sheetCells(t: TableBlock, r: Row, joinDims = false): SheetCell[] {
  return sheetColumns(t, joinDims).map((c) => c.cell(r));
}

const MIN_WIDTH = 6;
const MAX_WIDTH = 60;
/** A header wraps at its words; it asks for no more than this. */
const HEADER_WIDTH = 16;

const longestLine = (text: string) => Math.max(0, ...text.split('\n').map((l) => l.length));

/** Column widths that fit the tables sharing a sheet, column by column. */
export function tableWidths(tables: readonly TableBlock[], joinDims = false): number[] {
  const widths: number[] = [];
  for (const t of tables) {
    sheetColumns(t, joinDims).forEach((c, i) => {
      const need = Math.max(Math.min(c.header.length, HEADER_WIDTH), ...t.rows.map((r) => longestLine(c.text(r)))) + 2;
      widths[i] = Math.max(widths[i] ?? MIN_WIDTH, Math.min(MAX_WIDTH, need));
    });
  }
  return widths;
}

/** Writes the table from the sheet's next row: the header, then the rows; its empty text where it has none. */
export function addModelTable(ws: ExcelJS.Worksheet, t: TableBlock, widths: readonly number[], joinDims = false): ExcelJS.Row {
  const columns = sheetColumns(t, joinDims);
  const header = addHeaderRow(ws, columns.map((c) => c.header));
  if (t.rows.length === 0 && t.empty) ws.addRow([t.empty]).getCell(1).font = { italic: true };
  for (const r of t.rows) {
    const cells = columns.map((c) => c.cell(r));
    const row = ws.addRow(cells.map((c) => c.value));
    const wrapped: { text: string; width: number }[] = [];
    cells.forEach((c, i) => {
      const cell = row.getCell(i + 1);
      if (c.numFmt) cell.numFmt = c.numFmt;
      if (c.fill) {
        cell.fill = solidFill(c.fill);
        cell.font = { bold: true };
      }
      const text = typeof c.value === 'string' ? c.value : '';
      const width = widths[i] ?? MAX_WIDTH;
      if (text.includes('\n') || text.length > width) {
        cell.alignment = { wrapText: true, vertical: 'top' };
        wrapped.push({ text, width });
      } else {
        cell.alignment = { vertical: 'top' };
      }
    });
    if (r.total) row.font = { bold: true };
    if (r.muted) row.font = { italic: true, color: { argb: 'FF808080' } };
    row.height = wrappedHeight(wrapped);
  }
  return header;
}
