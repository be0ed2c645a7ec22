import type ExcelJS from 'exceljs';
import type { StockPlanGroup } from '../../core/cutlist/cutting-result.ts';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { CuttingPattern } from '../../core/stock/cutting-types.ts';
import { baselineText, BOUND_NOTE, boughtText, cutsText, minimisesText, sectionText } from '../cutting-text.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { barCells, barScale, barSegments, partLabels } from '../stock-bar.ts';
import { OFFCUT_FILL, partFill } from '../stock-palette.ts';
import { addCautionRow, addHeading, solidFill, sumOf, wrappedHeight } from './sheet-style.ts';

// Five ordinary columns, then narrow bar columns, each standing for a fixed
// length of stock. The group table's later fields span several bar columns.
const DATA_WIDTHS = [10, 16, 14, 50, 22];
const BAR_WIDTH = 1.6;
/** Most bar columns a stock piece may take. */
export const MAX_BAR_CELLS = 60;
/** Column of the first bar cell (1-based). */
export const BAR_FIRST_COLUMN = DATA_WIDTHS.length + 1;

interface Field {
  label: string;
  /** Columns the field covers; bar columns after the five data columns. */
  span: number;
  unit?: string;
}

const GROUP_FIELDS: Field[] = [
  { label: 'Group', span: 1 },
  { label: 'Species', span: 1 },
  { label: 'Section (mm)', span: 1 },
  { label: 'Method', span: 1 },
  { label: 'Stock bought', span: 1 },
  { label: 'Pieces', span: 6, unit: 'count' },
  { label: 'Cost', span: 7, unit: 'currency' },
  { label: 'Minimises', span: 8 },
  { label: 'LP bound', span: 7, unit: 'currency' },
  { label: 'Gap', span: 6 },
  { label: 'Optimal', span: 6 },
  { label: 'Waste (%)', span: 6, unit: '%' },
  { label: 'First-fit decreasing', span: 13 },
];
const PATTERN_FIELDS: Field[] = [
  { label: 'Pattern', span: 1 },
  { label: 'Stock length (mm)', span: 1, unit: 'mm' },
  { label: 'Count', span: 1, unit: 'count' },
  { label: 'Cuts in order', span: 1 },
  { label: 'Offcut (mm)', span: 1, unit: 'mm' },
];
const UNSERVED_FIELDS: Field[] = [
  { label: 'Part', span: 3 },
  { label: 'Why no listed stock serves it', span: 1 },
  { label: 'Buy instead', span: 40 },
];

export function addStockPlanSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Stock plan');
  const plan = result.cutting.stock_plan;
  const longest = Math.max(0, ...plan.groups.flatMap((g) => g.plan.patterns.map((p) => p.stock_length_mm)));
  const scale = barScale(longest || 1, MAX_BAR_CELLS);
  const barColumns = Math.max(MAX_BAR_CELLS, sumOf(GROUP_FIELDS.slice(DATA_WIDTHS.length).map((f) => f.span)));
  ws.columns = [...DATA_WIDTHS, ...Array(barColumns).fill(BAR_WIDTH)].map((width) => ({ width }));
  const span = DATA_WIDTHS.length;
  addCautionRow(ws, headlineCaution(result), span, sumOf(DATA_WIDTHS));
  ws.addRow([]);

  addHeading(ws, 'Stock to buy, by group');
  addFieldRow(ws, GROUP_FIELDS, GROUP_FIELDS.map((f) => f.label), true);
  plan.groups.forEach((g, i) => addGroupRow(ws, g, i + 1));
  const total = addFieldRow(ws, GROUP_FIELDS, ['All groups', null, null, null, null, plan.pieces, plan.cost ?? 'no prices', null, null, null, null, plan.waste_pct, null]);
  total.font = { bold: true };
  const note = ws.addRow([BOUND_NOTE]);
  note.getCell(1).font = { italic: true };

  const labels = partLabels(plan);
  plan.groups.forEach((g, i) => {
    ws.addRow([]);
    addHeading(ws, `Group ${i + 1}: ${g.species}, ${sectionText(g.section)} mm`, 12);
    addFieldRow(ws, PATTERN_FIELDS, PATTERN_FIELDS.map((f) => f.label), true);
    const barHead = ws.lastRow!.getCell(BAR_FIRST_COLUMN);
    barHead.value = `Bar: one column = ${scale} mm of stock; each part its own colour, offcut pale grey`;
    barHead.font = { bold: true };
    g.plan.patterns.forEach((p, k) => addPatternRow(ws, p, `${i + 1}.${k + 1}`, scale, labels));
  });

  if (plan.unserved.length > 0) {
    ws.addRow([]);
    addHeading(ws, 'Parts no listed stock serves');
    addFieldRow(ws, UNSERVED_FIELDS, UNSERVED_FIELDS.map((f) => f.label), true);
    for (const u of plan.unserved) addFieldRow(ws, UNSERVED_FIELDS, [u.part, u.reason, u.buy]).getCell(4).alignment = { wrapText: true, vertical: 'top' };
  }
}

function addGroupRow(ws: ExcelJS.Worksheet, g: StockPlanGroup, n: number): void {
  const p = g.plan;
  const row = addFieldRow(ws, GROUP_FIELDS, [
    n, g.species, sectionText(g.section), p.method, boughtText(p), p.pieces_used, p.cost ?? 'no prices',
    minimisesText(p), p.lower_bound, p.gap, p.optimal ? 'yes' : 'not proven', p.waste_pct, baselineText(p),
  ]);
  row.getCell(columnOf(GROUP_FIELDS, 'Gap')).numFmt = '0.0%';
  for (const c of [4, 5]) row.getCell(c).alignment = { wrapText: true, vertical: 'top' };
  row.height = wrappedHeight([{ text: p.method, width: DATA_WIDTHS[3] }, { text: boughtText(p), width: DATA_WIDTHS[4] }]);
}

function addPatternRow(ws: ExcelJS.Worksheet, p: CuttingPattern, id: string, scale: number, labels: readonly string[]): void {
  const cuts = cutsText(p);
  const row = addFieldRow(ws, PATTERN_FIELDS, [id, p.stock_length_mm, p.count, cuts, p.offcut_mm]);
  row.getCell(4).alignment = { wrapText: true, vertical: 'top' };
  row.height = wrappedHeight([{ text: cuts, width: DATA_WIDTHS[3] }]);
  const segments = barSegments(p);
  barCells(segments, p.stock_length_mm, scale).forEach((c, i) => {
    const cell = row.getCell(BAR_FIRST_COLUMN + i);
    const label = c.segment >= 0 ? segments[c.segment].label : null;
    cell.fill = solidFill(label === null ? OFFCUT_FILL : partFill(labels, label));
    if (c.first && label !== null) {
      // The label spills over the empty cells of its own part; a rule marks where each part starts.
      cell.value = label;
      cell.font = { size: 7 };
      cell.alignment = { vertical: 'middle', wrapText: false };
      cell.border = { left: { style: 'thin' } };
    }
  });
}

/** A row of fields, each merged across its span of columns. */
function addFieldRow(ws: ExcelJS.Worksheet, fields: readonly Field[], values: readonly (string | number | null)[], header = false): ExcelJS.Row {
  const row = ws.addRow([]);
  let col = 1;
  fields.forEach((f, i) => {
    const cell = row.getCell(col);
    cell.value = values[i] ?? null;
    if (header) {
      cell.font = { bold: true };
      cell.fill = solidFill('#D9D9D9');
      cell.alignment = { wrapText: true, vertical: 'bottom' };
    } else if (f.unit && typeof values[i] === 'number') {
      cell.numFmt = numFmtForUnit(f.unit);
    }
    if (f.span > 1) ws.mergeCells(row.number, col, row.number, col + f.span - 1);
    col += f.span;
  });
  return row;
}

function columnOf(fields: readonly Field[], label: string): number {
  const i = fields.findIndex((f) => f.label === label);
  return 1 + sumOf(fields.slice(0, i).map((f) => f.span));
}
