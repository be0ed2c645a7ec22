import type ExcelJS from 'exceljs';
import type { ReportDocument, TableBlock } from '../model/document.ts';
import { tableById, tablesOf } from '../model/find-table.ts';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { CuttingPattern } from '../../core/stock/cutting-types.ts';
import { BOUND_NOTE, sectionText } from '../cutting-text.ts';
import { barCells, barScale, barSegments, partLabels } from '../stock-bar.ts';
import { OFFCUT_FILL, partFill } from '../stock-palette.ts';
import { reportSheet } from './report-sheet.ts';
import { addHeading, font, solidFill, styleHeader, sumOf, wrappedHeight } from './sheet-style.ts';
import { setPrint } from './print-setup.ts';
import { sheetCells, sheetHeaders, type SheetCell } from './sheet-table.ts';

// Five ordinary columns, then narrow bar columns, each standing for a fixed
// length of stock. The tables are the report model's; the groups table's later
// fields each span several bar columns.
const DATA_WIDTHS = [10, 16, 14, 50, 22];
const BAR_WIDTH = 1.6;
/** Most bar columns a stock piece may take. */
export const MAX_BAR_CELLS = 60;
/** Column of the first bar cell (1-based). */
export const BAR_FIRST_COLUMN = DATA_WIDTHS.length + 1;

/** Columns each field of a table covers, in the model's column order. */
const GROUP_SPANS = [1, 1, 1, 1, 1, 6, 7, 8, 7, 6, 6, 6, 13];
const PATTERN_SPANS = [1, 1, 1, 1, 1];
const UNSERVED_SPANS = [3, 1, 40];
/** Columns whose text wraps (method, stock bought, cuts, why unserved). */
const WRAPPED_COLUMNS = [4, 5];

export function addStockPlanSheet(wb: ExcelJS.Workbook, doc: ReportDocument, result: CheckResult): void {
  const plan = result.cutting.stock_plan;
  const groups = tableById(doc, 'stock-groups');
  const longest = Math.max(0, ...plan.groups.flatMap((g) => g.plan.patterns.map((p) => p.stock_length_mm)));
  const scale = barScale(longest || 1, MAX_BAR_CELLS);
  const barColumns = Math.max(MAX_BAR_CELLS, sumOf(GROUP_SPANS.slice(DATA_WIDTHS.length)));
  const { ws } = reportSheet(wb, 'Stock plan', doc, [], { widths: [...DATA_WIDTHS, ...Array<number>(barColumns).fill(BAR_WIDTH)] });
  ws.addRow([]);

  addHeading(ws, 'Stock to buy, by group');
  addTable(ws, groups, GROUP_SPANS);
  ws.addRow([BOUND_NOTE]).getCell(1).font = font({ italic: true });

  const labels = partLabels(plan);
  plan.groups.forEach((g, i) => {
    const patterns = tableById(doc, `stock-patterns-${i}`);
    ws.addRow([]);
    addHeading(ws, `Group ${i + 1}: ${g.species}, ${sectionText(g.section)} mm`, 12);
    const header = addTable(ws, patterns, PATTERN_SPANS, (row, k) => drawBar(row, g.plan.patterns[k], scale, labels));
    const barHead = header.getCell(BAR_FIRST_COLUMN);
    barHead.value = `Bar: one column = ${scale} mm of stock; each part its own colour, offcut pale grey`;
    barHead.font = font({ bold: true });
  });

  const unserved = tablesOf(doc).find((t) => t.id === 'stock-unserved');
  if (unserved) {
    ws.addRow([]);
    addHeading(ws, 'Parts no listed stock serves');
    addTable(ws, unserved, UNSERVED_SPANS);
  }
  setPrint(ws);
}

/** A model table with each field merged across its span of columns; `after` adds to each body row. Returns the header row. */
function addTable(ws: ExcelJS.Worksheet, t: TableBlock, spans: readonly number[], after?: (row: ExcelJS.Row, k: number) => void): ExcelJS.Row {
  const headers = sheetHeaders(t, true);
  if (headers.length !== spans.length) throw new Error(`the stock plan sheet lays out ${spans.length} fields; the table "${t.id}" has ${headers.length}`);
  const header = addFieldRow(ws, spans, headers.map((value) => ({ value })), true);
  t.rows.forEach((r, k) => {
    const row = addFieldRow(ws, spans, sheetCells(t, r, true));
    if (r.total) row.font = font({ bold: true });
    after?.(row, k);
  });
  return header;
}

function drawBar(row: ExcelJS.Row, p: CuttingPattern, scale: number, labels: readonly string[]): void {
  const segments = barSegments(p);
  barCells(segments, p.stock_length_mm, scale).forEach((c, i) => {
    const cell = row.getCell(BAR_FIRST_COLUMN + i);
    const label = c.segment >= 0 ? segments[c.segment].label : null;
    cell.fill = solidFill(label === null ? OFFCUT_FILL : partFill(labels, label));
    if (c.first && label !== null) {
      // The label spills over the empty cells of its own part; a rule marks where each part starts.
      cell.value = label;
      cell.font = font({ size: 7 });
      cell.alignment = { vertical: 'middle', wrapText: false };
      cell.border = { left: { style: 'thin' } };
    }
  });
}

/** A row of fields, each merged across its span of columns. */
function addFieldRow(ws: ExcelJS.Worksheet, spans: readonly number[], cells: readonly SheetCell[], header = false): ExcelJS.Row {
  const row = ws.addRow([]);
  const wrapped: { text: string; width: number }[] = [];
  let col = 1;
  spans.forEach((span, i) => {
    const cell = row.getCell(col);
    const c = cells[i];
    cell.value = c.value;
    if (header) {
      styleHeader(cell);
    } else {
      if (c.numFmt) cell.numFmt = c.numFmt;
      if (WRAPPED_COLUMNS.includes(col) && span === 1 && typeof c.value === 'string') {
        cell.alignment = { wrapText: true, vertical: 'top' };
        wrapped.push({ text: c.value, width: DATA_WIDTHS[col - 1] });
      }
    }
    if (span > 1) ws.mergeCells(row.number, col, row.number, col + span - 1);
    col += span;
  });
  if (!header) row.height = wrappedHeight(wrapped);
  return row;
}
