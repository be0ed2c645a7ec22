import type ExcelJS from 'exceljs';
import type { Block, ReportDocument, TableBlock } from '../model/document.ts';
import { addCautionRow, addHeading, setColumnWidths, sumOf } from './sheet-style.ts';
import { addModelTable, tableWidths, type TableLayout } from './sheet-table.ts';

/** A column width for sheets of a few long texts, narrow enough that they print upright at a readable size. */
export const NARROW_TEXT = 45;

/** The one-line caution every sheet opens with: the report's closing line, which a report without cautions never has. */
export function sheetCaution(doc: ReportDocument): string {
  if (!doc.closing) throw new Error('the report carries no caution; refusing to write a workbook without it');
  return doc.closing;
}

/** A new sheet sized for the tables it will hold, opening with the caution; `frozen` keeps the caution and a header row in view. */
export function reportSheet(
  wb: ExcelJS.Workbook,
  name: string,
  doc: ReportDocument,
  tables: readonly TableBlock[],
  o: { frozen?: boolean; widths?: readonly number[] } & TableLayout = {},
): { ws: ExcelJS.Worksheet; widths: number[] } {
  const ws = wb.addWorksheet(name, o.frozen ? { views: [{ state: 'frozen', ySplit: 2 }] } : {});
  const fitted = tableWidths(tables, o);
  const widths = Array.from({ length: Math.max(o.widths?.length ?? 0, fitted.length) }, (_, i) => Math.max(o.widths?.[i] ?? 0, fitted[i] ?? 0));
  setColumnWidths(ws, widths);
  addCautionRow(ws, sheetCaution(doc), widths.length, sumOf(widths));
  return { ws, widths };
}

/** The blocks of a kind in a section, in order. */
export function blocksOf<K extends Block['kind']>(blocks: readonly Block[], kind: K): Extract<Block, { kind: K }>[] {
  return blocks.filter((b): b is Extract<Block, { kind: K }> => b.kind === kind);
}

/** A table to write, under a heading of its own where it has one. */
export interface SheetPart {
  heading?: string;
  table: TableBlock;
}

/**
 * A sheet of model tables one under another, a blank row between them and
 * each one's heading where it has one; returns the sheet, its widths and each table's
 * header row.
 */
export function tablesSheet(
  wb: ExcelJS.Workbook,
  name: string,
  doc: ReportDocument,
  parts: readonly SheetPart[],
  o: { frozen?: boolean } & TableLayout = {},
): { ws: ExcelJS.Worksheet; widths: number[]; headers: ExcelJS.Row[] } {
  const { ws, widths } = reportSheet(wb, name, doc, parts.map((p) => p.table), o);
  const headers = parts.map((p, i) => {
    if (i > 0 || p.heading) ws.addRow([]);
    if (p.heading) addHeading(ws, p.heading);
    return addModelTable(ws, p.table, widths, o);
  });
  return { ws, widths, headers };
}

/** A filter over a table's header and every row below it. */
export function filterFrom(ws: ExcelJS.Worksheet, header: ExcelJS.Row, columns: number): void {
  ws.autoFilter = { from: { row: header.number, column: 1 }, to: { row: Math.max(header.number, ws.rowCount), column: columns } };
}
