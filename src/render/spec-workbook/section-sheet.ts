import type ExcelJS from 'exceljs';
import type { Field, Section, Table } from '../../core/spec/spec-fields.ts';
import { addHeaderRow, font, setColumnWidths, wrappedHeight } from '../sheets/sheet-style.ts';
import { setPrint } from '../sheets/print-setup.ts';
import { validationFor } from './cell-validation.ts';
import { QUIET_FONT, REQUIRED_FONT, styleInput, styleLabel } from './input-style.ts';
import { COL, TABLE_ENTRY_OFFSET, TABLE_FIRST_COL, TABLE_HEADER_OFFSET, TABLE_SPARE_ROWS, tableKey } from '../../core/input/workbook-layout.ts';
import { cellText, valueAt } from '../../core/input/spec-values.ts';

const WIDTHS = [28, 24, 16, 8, 12, 56];
const TABLE_WIDTH = 18;
/** Empty entry rows printed below a table's entries, to write more in by hand; a table prints at least so many rows (or all it has). */
const PRINTED_SPARE_ROWS = 2;
const PRINTED_LEAST_ROWS = 5;
type ListRange = Parameters<typeof validationFor>[1];

/** What the default column says: the default, or whether the key may be left out. */
export function defaultText(f: Field): string {
  if (f.default !== undefined && typeof f.default !== 'object') return cellText(f.default);
  if (f.computedDefault) return 'computed';
  return f.required ? 'required' : 'optional';
}

/** One sheet for one section: a row per key, then a table per list of entries. */
export function addSectionSheet(wb: ExcelJS.Workbook, section: Section, value: unknown, listRange: ListRange): ExcelJS.Worksheet {
  const ws = wb.addWorksheet(section.sheet, { views: [{ state: 'frozen', ySplit: section.fields.length ? 2 : 1 }] });
  const widest = Math.max(0, ...section.tables.map((t) => t.fields.length + 1));
  setColumnWidths(ws, Array.from({ length: Math.max(WIDTHS.length, widest) }, (_, i) => (section.fields.length || i === 0 ? (WIDTHS[i] ?? TABLE_WIDTH) : TABLE_WIDTH)));
  const title = ws.getRow(1);
  title.getCell(1).value = section.sheet;
  title.getCell(1).font = font({ bold: true, size: 13 });
  title.getCell(2).value = section.help || `The ${section.path.join('.') || 'top-level'} keys of the specification.`;
  ws.mergeCells(1, 2, 1, WIDTHS.length);
  title.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  title.height = wrappedHeight([{ text: title.getCell(2).text, width: WIDTHS.slice(1).reduce((a, b) => a + b, 0) }]);
  if (section.fields.length) {
    addHeaderRow(ws, ['Key', 'Label', 'Value', 'Unit', 'Default', 'Help']); // appended: row 2
    section.fields.forEach((f, i) => addFieldRow(ws, 3 + i, f, valueAt(value, f.path), listRange));
  }
  let row = section.fields.length ? 3 + section.fields.length + 1 : 3;
  let lastPrinted = section.fields.length ? 2 + section.fields.length : 2;
  for (const table of section.tables) {
    const at = row;
    const entries = valueAt(value, table.path);
    row = addTable(ws, at, section, table, entries, listRange) + 1;
    const filled = Array.isArray(entries) ? entries.length : 0;
    lastPrinted = at + TABLE_ENTRY_OFFSET + Math.min(row - at - TABLE_ENTRY_OFFSET, Math.max(filled + PRINTED_SPARE_ROWS, PRINTED_LEAST_ROWS)) - 1;
  }
  setPrint(ws, { lastRow: lastPrinted });
  return ws;
}

function addFieldRow(ws: ExcelJS.Worksheet, at: number, f: Field, value: unknown, listRange: ListRange): void {
  const row = ws.getRow(at);
  row.getCell(COL.key).value = f.key;
  row.getCell(COL.label).value = f.label;
  row.getCell(COL.unit).value = f.unit || null;
  row.getCell(COL.default).value = defaultText(f);
  row.getCell(COL.help).value = f.help || null;
  for (const col of [COL.key, COL.label, COL.unit, COL.default, COL.help]) styleLabel(row.getCell(col));
  row.getCell(COL.key).font = QUIET_FONT;
  if (f.required) row.getCell(COL.label).font = REQUIRED_FONT;
  fillInput(row.getCell(COL.value), f, value, listRange);
  row.height = wrappedHeight([{ text: f.help, width: WIDTHS[COL.help - 1] }, { text: f.label, width: WIDTHS[COL.label - 1] }]);
}

function fillInput(cell: ExcelJS.Cell, f: Field, value: unknown, listRange: ListRange): void {
  styleInput(cell);
  if (f.type === 'string' || f.type === 'list') cell.numFmt = '@'; // typed digits stay text
  const rule = validationFor(f, listRange);
  if (rule) cell.dataValidation = rule;
  if (value === undefined || value === null) return;
  cell.value = Array.isArray(value) ? cellText(value) : (value as ExcelJS.CellValue);
}

/** A table: heading, keys, units and defaults, then entry rows; returns its last row. */
function addTable(ws: ExcelJS.Worksheet, at: number, section: Section, table: Table, value: unknown, listRange: ListRange): number {
  const entries = Array.isArray(value) ? value : [];
  const heading = ws.getRow(at);
  heading.getCell(1).value = tableKey(section, table);
  heading.getCell(1).font = font({ bold: true });
  const limit = table.maxItems !== undefined ? `, at most ${table.maxItems}` : '';
  heading.getCell(2).value = `${table.label || section.sheet}: one row per entry${table.minItems ? `, at least ${table.minItems}` : ''}${limit}.${table.help ? ` ${table.help}` : ''}`;
  heading.getCell(2).font = font({ bold: true });
  const header = ws.getRow(at + TABLE_HEADER_OFFSET);
  const about = ws.getRow(at + TABLE_HEADER_OFFSET + 1);
  header.getCell(1).value = '#';
  about.getCell(1).value = 'unit; default';
  styleLabel(header.getCell(1));
  styleLabel(about.getCell(1));
  about.getCell(1).font = QUIET_FONT;
  table.fields.forEach((f, i) => {
    const h = header.getCell(TABLE_FIRST_COL + i);
    h.value = f.key;
    styleLabel(h);
    h.font = f.required ? REQUIRED_FONT : font();
    h.note = `${f.label}. ${f.help}`.trim();
    const a = about.getCell(TABLE_FIRST_COL + i);
    a.value = `${f.unit || '-'}; ${defaultText(f)}`;
    styleLabel(a);
    a.font = QUIET_FONT;
  });
  const rows = Math.max(entries.length, table.maxItems ?? Math.max(TABLE_SPARE_ROWS, entries.length + 5));
  for (let e = 0; e < rows; e++) {
    const row = ws.getRow(at + TABLE_ENTRY_OFFSET + e);
    row.getCell(1).value = e + 1;
    styleLabel(row.getCell(1));
    table.fields.forEach((f, i) => fillInput(row.getCell(TABLE_FIRST_COL + i), f, valueAt(entries[e], f.path), listRange));
  }
  return at + TABLE_ENTRY_OFFSET + rows - 1;
}
