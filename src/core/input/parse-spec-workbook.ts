// Reads a filled specification workbook into the same raw specification a
// YAML file gives, with a locator from key path to sheet and cell.
import ExcelJS from 'exceljs';
import { issue, type InputIssue, type KeyPath } from '../spec/input-issue.ts';
import { specSections, type Field, type Section, type Table } from '../spec/spec-fields.ts';
import type { Located, ReadSpec } from './read-spec-result.ts';
import { fieldValue } from './cell-value.ts';
import { cellName, COL, columnName, COVER_SHEET, HEADER_ROW, LISTS_SHEET, RESULT_CATEGORY, TABLE_ENTRY_OFFSET, TABLE_FIRST_COL, TABLE_HEADER_OFFSET, tableKey } from './workbook-layout.ts';
import { setAt } from './spec-values.ts';
import { INPUT_LIMITS } from './input-limits.ts';

type LocatedIssue = InputIssue & { at?: Located };

export async function parseSpecWorkbook(bytes: Uint8Array, path = 'input'): Promise<ReadSpec> {
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch (e) {
    return { ok: false, issues: [issue([], 'notAWorkbook', { path, reason: (e as Error).message.split('\n')[0] })] };
  }
  return new WorkbookReader(wb).read();
}

class WorkbookReader {
  private readonly raw: Record<string, unknown> = {};
  private readonly places = new Map<string, Located>();
  private readonly issues: LocatedIssue[] = [];
  private readonly sections = specSections();

  constructor(private readonly wb: ExcelJS.Workbook) {}

  read(): ReadSpec {
    this.checkSheets();
    // A sheet past the size limits is refused, not read: its rows are walked cell by cell.
    const tooBig = new Set(this.wb.worksheets.filter((ws) => !this.withinLimits(ws)).map((ws) => ws.name));
    for (const s of this.sections) {
      const ws = this.wb.getWorksheet(s.sheet);
      if (ws && !tooBig.has(ws.name)) this.readSection(ws, s);
    }
    if (this.issues.length) return { ok: false, issues: this.issues };
    return { ok: true, raw: this.raw, locate: (p) => this.locate(p) };
  }

  /** Every section sheet must be there; another sheet is refused, except a check result's own. */
  private checkSheets(): void {
    const names = new Set(this.sections.map((s) => s.sheet));
    const allowed = [COVER_SHEET, ...names];
    for (const s of this.sections) {
      if (!this.wb.getWorksheet(s.sheet)) this.issues.push(issue(s.path, 'sheetMissing', { sheet: s.sheet, what: s.path.length ? `the ${s.path[0]} section` : 'the top-level keys' }));
    }
    if (this.wb.category === RESULT_CATEGORY) return;
    for (const ws of this.wb.worksheets) {
      if (names.has(ws.name) || ws.name === COVER_SHEET || ws.name === LISTS_SHEET) continue;
      this.issues.push(this.at(issue([], 'sheetExtra', { sheet: ws.name, allowed: allowed.join(', ') }), ws.name, 1, 1));
    }
  }

  /** The limits the file was checked against before it was opened, checked again for a workbook read from bytes directly. */
  private withinLimits(ws: ExcelJS.Worksheet): boolean {
    const { sheetRows, sheetColumns } = INPUT_LIMITS;
    if (ws.rowCount <= sheetRows && ws.columnCount <= sheetColumns) return true;
    const reach = `row ${ws.rowCount} and column ${columnName(ws.columnCount)}`;
    this.issues.push(this.at(issue([], 'sheetTooBig', { sheet: ws.name, reach, rows: sheetRows, columns: columnName(sheetColumns) }), ws.name, 1, 1));
    return false;
  }

  private at(i: InputIssue, sheet: string, row: number, col: number): LocatedIssue {
    return { ...i, at: { line: row, column: col, cell: cellName(sheet, row, col) } };
  }

  private place(path: KeyPath, sheet: string, row: number, col: number): void {
    this.places.set(JSON.stringify(path), { line: row, column: col, cell: cellName(sheet, row, col) });
  }

  /** The cell of the path, or of the nearest enclosing key that has one. */
  private locate(path: KeyPath): Located | undefined {
    for (let n = path.length; n >= 0; n--) {
      const hit = this.places.get(JSON.stringify(path.slice(0, n)));
      if (hit) return hit;
    }
    return undefined;
  }

  private readSection(ws: ExcelJS.Worksheet, s: Section): void {
    if (s.path.length) this.place(s.path, ws.name, 1, 1);
    const fields = new Map(s.fields.map((f) => [f.key, f]));
    const tables = new Map(s.tables.map((t) => [tableKey(s, t), t]));
    const headings: { row: number; table: Table }[] = [];
    const seen = new Map<string, number>();
    for (let r = HEADER_ROW + 1; r <= ws.rowCount; r++) {
      const key = ws.getCell(r, COL.key).value;
      if (typeof key !== 'string' || key.trim() === '') continue;
      const k = key.trim();
      const table = tables.get(k);
      if (table) {
        headings.push({ row: r, table });
        continue;
      }
      if (headings.length) continue; // inside a table: column A numbers the entries
      const f = fields.get(k);
      if (!f) {
        this.issues.push(this.at(issue(s.path, 'rowUnknown', { key: k, allowed: [...fields.keys()].join(', ') }), ws.name, r, COL.key));
        continue;
      }
      const other = seen.get(k);
      if (other !== undefined) {
        this.issues.push(this.at(issue([...s.path, ...f.path], 'rowTwice', { key: k, other: cellName(ws.name, other, COL.key) }), ws.name, r, COL.key));
        continue;
      }
      seen.set(k, r);
      this.readCell(ws, r, COL.value, [...s.path, ...f.path], f);
    }
    headings.forEach((h, i) => this.readTable(ws, s, h.table, h.row, headings[i + 1]?.row ?? ws.rowCount + 1));
  }

  private readCell(ws: ExcelJS.Worksheet, row: number, col: number, path: KeyPath, f: Field): boolean {
    this.place(path, ws.name, row, col);
    const value = fieldValue(f, ws.getCell(row, col).value);
    if (value === undefined) return false;
    setAt(this.raw, path, value);
    return true;
  }

  /** Entries from the heading's row down to the next heading; an empty row is no entry. */
  private readTable(ws: ExcelJS.Worksheet, s: Section, table: Table, heading: number, end: number): void {
    const base = [...s.path, ...table.path];
    this.place(base, ws.name, heading, 1);
    const header = heading + TABLE_HEADER_OFFSET;
    const byKey = new Map(table.fields.map((f) => [f.key, f]));
    const columns: { col: number; f: Field }[] = [];
    for (let c = TABLE_FIRST_COL; c <= ws.columnCount; c++) {
      const key = ws.getCell(header, c).value;
      if (typeof key !== 'string' || key.trim() === '') continue;
      const f = byKey.get(key.trim());
      if (f) columns.push({ col: c, f });
      else this.issues.push(this.at(issue(base, 'rowUnknown', { key: key.trim(), allowed: [...byKey.keys()].join(', ') }), ws.name, header, c));
    }
    let index = 0;
    for (let r = heading + TABLE_ENTRY_OFFSET; r < end; r++) {
      const filled = columns.some(({ col, f }) => fieldValue(f, ws.getCell(r, col).value) !== undefined);
      if (!filled) continue;
      this.place([...base, index], ws.name, r, TABLE_FIRST_COL);
      for (const { col, f } of columns) this.readCell(ws, r, col, [...base, index, ...f.path], f);
      index++;
    }
  }
}
