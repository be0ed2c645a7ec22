// A workbook's size checked before the spreadsheet library opens it: the
// library unpacks every part into memory and builds an object per cell, so
// a zip bomb, a sheet reaching its last row or a few hundred thousand rows
// would cost gigabytes before the reader saw a single key. Each part is
// unpacked here within what is left of the budget (a directory that lies
// about sizes gains nothing), and each sheet's XML is scanned for the rows
// and cells it holds, the range it claims, and the ranges the library would
// expand cell by cell (workbook-ranges.ts).
import { echo } from '../core/diagnostics/echo.ts';
import { bytesText, INPUT_LIMITS } from '../core/input/input-limits.ts';
import { columnName } from '../core/input/workbook-layout.ts';
import { issue, type InputIssue } from '../core/spec/input-issue.ts';
import { namedCoverings, sheetCoverings, type Covering } from './workbook-ranges.ts';
import { readZipDirectory, unpackPart, type ZipPart } from './zip-directory.ts';

const SHEET_PART = /^\/?xl\/worksheets\/sheet\d+\.xml$/;
const WORKBOOK_PART = 'xl/workbook.xml';

/** What is wrong with the workbook's size, or nothing. `path` names it in the messages. */
export function workbookLimitIssues(zip: Uint8Array, path: string): InputIssue[] {
  const L = INPUT_LIMITS;
  const dir = readZipDirectory(zip, L.workbookParts);
  if (!dir.ok) return [issue([], 'notAWorkbook', { path, reason: dir.reason })];
  if (dir.count > L.workbookParts) return [issue([], 'workbookParts', { path, count: dir.count, max: L.workbookParts })];
  const tooBig = (where = '') => [issue([], 'workbookUnpacked', { path, max: bytesText(L.workbookUnpacked), where })];
  const stated = dir.parts.reduce((sum, p) => sum + p.statedSize, 0);
  if (stated > L.workbookUnpacked) return tooBig(`: its parts state ${bytesText(stated)}`);
  const names = sheetNames(dir.parts, zip);
  const issues: InputIssue[] = [];
  let left = L.workbookUnpacked;
  let cells = 0;
  const covered: (Covering & { sheet: string })[] = [];
  for (const part of dir.parts) {
    if (part.name.endsWith('/')) continue; // a folder
    const out = unpackPart(zip, part, Math.min(part.statedSize, left));
    if (out === undefined) return tooBig(`: the part ${part.name} unpacks to more than the ${bytesText(part.statedSize)} its directory entry states`);
    if (typeof out === 'string') return [issue([], 'notAWorkbook', { path, reason: out })];
    left -= out.length;
    if (part.name.replace(/^\//, '') === WORKBOOK_PART) covered.push(...namedCoverings(out.toString('utf8')).map((c) => ({ ...c, sheet: '' })));
    if (!SHEET_PART.test(part.name)) continue;
    const name = names.get(part.name.replace(/^\//, '')) ?? part.name;
    const xml = out.toString('latin1');
    covered.push(...sheetCoverings(xml).map((c) => ({ ...c, sheet: name })));
    const sheet = scanSheet(xml, L.workbookCells - cells);
    cells += sheet.cells;
    const reach = Math.max(sheet.lastRow, sheet.stated.row) > L.sheetRows || Math.max(sheet.lastColumn, sheet.stated.column) > L.sheetColumns || sheet.styledColumns > FORMAT_COLUMNS;
    if (reach) issues.push(issue([], 'sheetTooBig', { sheet: name, reach: reachText(sheet), rows: L.sheetRows, columns: columnName(L.sheetColumns) }));
  }
  if (cells > L.workbookCells) issues.push(issue([], 'workbookCells', { path, max: L.workbookCells }));
  const rangeCells = covered.reduce((n, c) => n + c.cells, 0);
  if (rangeCells > L.rangeCells) {
    const widest = covered.reduce((a, b) => (b.cells > a.cells ? b : a));
    const where = widest.sheet ? ` on the sheet "${echo(widest.sheet)}"` : '';
    issues.push(issue([], 'rangesTooBig', { path, what: `${widest.what} over ${echo(widest.ref)}${where}`, count: widest.cells, max: L.rangeCells }));
  }
  return issues;
}

interface SheetScan {
  /** The last row and column holding a row or cell element. */
  lastRow: number;
  lastColumn: number;
  cells: number;
  /** The end of the range the sheet's <dimension> claims. */
  stated: { row: number; column: number };
  /** The last column given a width or style (<col max>): the library makes an object for each column up to it. */
  styledColumns: number;
}

// Elements may carry a namespace prefix (<x:row>); `r` attributes may be absent (then the next row or column is meant).
const ROW = /<(?:\w+:)?row\b([^>]*)>/g;
const CELL = /<(?:\w+:)?c\b([^>]*)>/g;
const DIMENSION = /<(?:\w+:)?dimension\b[^>]*\bref="([^"]*)"/;
const REF = /\br="([^"]*)"/;
const COL_MAX = /<(?:\w+:)?col\b[^>]*\bmax="(\d+)"/g;
/** The last column of the file format (XFD): spreadsheet programs style columns up to it, so only beyond it is refused. */
export const FORMAT_COLUMNS = 16_384;

/**
 * Rows, cells and the claimed range of a worksheet's XML, by a scan that
 * builds nothing per cell; it stops counting once past the row limit or
 * `maxCells`, as the sheet is refused then anyway.
 */
export function scanSheet(xml: string, maxCells: number): SheetScan {
  let lastRow = 0;
  let row = 0;
  for (const m of xml.matchAll(ROW)) {
    const r = REF.exec(m[1])?.[1];
    row = r !== undefined && /^\d+$/.test(r) ? Number(r) : row + 1;
    lastRow = Math.max(lastRow, row);
    if (lastRow > INPUT_LIMITS.sheetRows) break;
  }
  let lastColumn = 0;
  let cells = 0;
  for (const m of xml.matchAll(CELL)) {
    if (++cells > maxCells) break;
    const ref = cellRef(REF.exec(m[1])?.[1] ?? '');
    if (ref) {
      lastColumn = Math.max(lastColumn, ref.column);
      lastRow = Math.max(lastRow, ref.row);
    }
  }
  const range = DIMENSION.exec(xml)?.[1].split(':').pop() ?? '';
  let styledColumns = 0;
  for (const m of xml.matchAll(COL_MAX)) styledColumns = Math.max(styledColumns, Number(m[1]));
  return { lastRow, lastColumn, cells, stated: cellRef(range) ?? { row: 0, column: 0 }, styledColumns };
}

function cellRef(ref: string): { row: number; column: number } | undefined {
  const m = /^\$?([A-Za-z]+)\$?(\d+)$/.exec(ref);
  if (!m) return undefined;
  let column = 0;
  for (const ch of m[1].toUpperCase()) column = column * 26 + (ch.charCodeAt(0) - 64);
  return { row: Number(m[2]), column };
}

function reachText(s: SheetScan): string {
  if (s.styledColumns > FORMAT_COLUMNS) return `column ${s.styledColumns} in its column widths, past the last column a workbook can have (${columnName(FORMAT_COLUMNS)})`;
  const row = Math.max(s.lastRow, s.stated.row);
  const column = Math.max(s.lastColumn, s.stated.column);
  const claimed = s.stated.row > s.lastRow || s.stated.column > s.lastColumn ? ' (as its stated range says)' : '';
  return `row ${row} and column ${columnName(column)}${claimed}`;
}

// The sheet names by part, from the workbook's list of sheets and its relationships; a sheet not found is named by its part.
function sheetNames(parts: ZipPart[], zip: Uint8Array): Map<string, string> {
  const text = (name: string): string => {
    const part = parts.find((p) => p.name.replace(/^\//, '') === name);
    const out = part && part.statedSize <= INPUT_LIMITS.workbookUnpacked ? unpackPart(zip, part, part.statedSize) : undefined;
    return out instanceof Buffer ? out.toString('utf8') : '';
  };
  const targets = new Map<string, string>();
  for (const m of text('xl/_rels/workbook.xml.rels').matchAll(/<Relationship\b[^>]*>/g)) {
    const id = /\bId="([^"]*)"/.exec(m[0])?.[1];
    const target = /\bTarget="([^"]*)"/.exec(m[0])?.[1];
    if (id && target) targets.set(id, target.startsWith('/') ? target.slice(1) : `xl/${target}`);
  }
  const names = new Map<string, string>();
  for (const m of text('xl/workbook.xml').matchAll(/<(?:\w+:)?sheet\b[^>]*>/g)) {
    const name = /\bname="([^"]*)"/.exec(m[0])?.[1];
    const id = /\br:id="([^"]*)"/.exec(m[0])?.[1];
    const target = id !== undefined ? targets.get(id) : undefined;
    if (name !== undefined && target) names.set(target, unescapeXml(name));
  }
  return names;
}

function unescapeXml(s: string): string {
  return s.replace(/&(lt|gt|quot|apos|amp);/g, (_, e: string) => ({ lt: '<', gt: '>', quot: '"', apos: "'", amp: '&' })[e] ?? '');
}
