import type ExcelJS from 'exceljs';
import type { Cell, Column, Row, TableBlock } from '../model/document.ts';
import { cellText, headerText } from '../model/cell-text.ts';
import type { Severity } from '../../core/findings/finding.ts';
import { markedSeverity } from '../severity-palette.ts';
import { cellNumber, numFmtForUnit, PERCENT_FORMAT } from './cell-format.ts';
import { addHeaderRow, font, styleSeverity, wrappedHeight } from './sheet-style.ts';
import { QUIET_INK } from './sheet-palette.ts';
import { toArgb } from '../severity-palette.ts';

// A table of the report model written to a worksheet: the same columns and
// rows as the Markdown and HTML tables, with the workbook-only columns too.
// Numbers stay raw, with a number format by unit; a dims cell (L x W x T)
// gives each length a column of its own, unless the sheet asks to join them.

export interface SheetCell {
  value: ExcelJS.CellValue;
  numFmt?: string;
  /** A severity: the word is the value; the cell takes the severity's fill, ink and mark. */
  severity?: Severity;
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
      return { value: cell.severity, severity: cell.severity };
  }
}

function dimsPart(cell: Cell, k: number, column: Column): SheetCell {
  if (cell.kind === 'dims') return { value: cell.values[k], numFmt: numFmtForUnit(cell.unit) };
  return k === 0 ? single(cell, column) : { value: null };
}

/** The text a spreadsheet shows for a cell: a number by its format (never its unit, which stands elsewhere), a severity with its mark. */
function shownText(c: SheetCell): string {
  if (c.severity) return markedSeverity(c.severity);
  if (typeof c.value === 'string') return c.value;
  if (typeof c.value !== 'number') return '';
  if (c.numFmt === PERCENT_FORMAT) return `${(c.value * 100).toFixed(1)}%`;
  const decimals = /\.(0+)/.exec(c.numFmt ?? '')?.[1].length ?? 0;
  return c.value.toFixed(decimals);
}

/** The sheet's columns for a model table, every one shown, dims split unless joined. */
function sheetColumns(t: TableBlock, joinDims: boolean): SheetColumn[] {
  return t.columns.flatMap((c, i): SheetColumn[] => {
    const column = (header: string, cell: (r: Row) => SheetCell): SheetColumn => ({ header, cell, text: (r) => shownText(cell(r)) });
    if (!c.parts || joinDims) return [column(headerText(c), (r) => single(r.cells[i], c))];
    return c.parts.map((part, k) => column(headerText({ ...c, parts: [part] }), (r) => dimsPart(r.cells[i], k, c)));
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
export function tableWidths(tables: readonly TableBlock[], o: Pick<TableLayout, 'joinDims' | 'maxWidth'> = {}): number[] {
  const most = o.maxWidth ?? MAX_WIDTH;
  const widths: number[] = [];
  for (const t of tables) {
    sheetColumns(t, o.joinDims ?? false).forEach((c, i) => {
      const need = Math.max(Math.min(c.header.length, HEADER_WIDTH), ...t.rows.map((r) => longestLine(c.text(r)))) + 2;
      widths[i] = Math.max(widths[i] ?? MIN_WIDTH, Math.min(most, need));
    });
  }
  return widths;
}

export interface TableLayout {
  joinDims?: boolean;
  /** Columns beyond this many are left off the paper: their wrapped text does not make a row taller. */
  printedColumns?: number;
  /** The widest a column may be fitted (its text wraps beyond it). */
  maxWidth?: number;
}

/** Writes the table from the sheet's next row: the header, then the rows; its empty text where it has none. */
export function addModelTable(ws: ExcelJS.Worksheet, t: TableBlock, widths: readonly number[], o: TableLayout = {}): ExcelJS.Row {
  const columns = sheetColumns(t, o.joinDims ?? false);
  const printed = o.printedColumns ?? columns.length;
  const header = addHeaderRow(ws, columns.map((c) => c.header));
  if (t.rows.length === 0 && t.empty) ws.addRow([t.empty]).getCell(1).font = font({ italic: true });
  for (const r of t.rows) {
    const cells = columns.map((c) => c.cell(r));
    const row = ws.addRow(cells.map((c) => c.value));
    const wrapped: { text: string; width: number }[] = [];
    cells.forEach((c, i) => {
      const cell = row.getCell(i + 1);
      if (c.numFmt) cell.numFmt = c.numFmt;
      if (c.severity) styleSeverity(cell, c.severity);
      const text = typeof c.value === 'string' ? c.value : '';
      const width = widths[i] ?? MAX_WIDTH;
      if (text.includes('\n') || text.length > width) {
        cell.alignment = { wrapText: true, vertical: 'top' };
        if (i < printed) wrapped.push({ text, width });
      } else {
        cell.alignment = { vertical: 'top' };
      }
    });
    if (r.total) row.font = font({ bold: true });
    if (r.muted) row.font = font({ italic: true, color: { argb: toArgb(QUIET_INK) } });
    row.height = wrappedHeight(wrapped);
  }
  return header;
}
