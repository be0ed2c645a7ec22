import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, addHeading, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

// The items table and the hides table share the sheet's columns.
const WIDTHS = [28, 14, 8, 12, 12, 12, 12, 60];
const ITEM_HEADER = ['Item', 'Material', 'Qty', 'Width (mm)', 'Thickness (mm)', 'Length, one piece (mm)', 'Area, all pieces (m²)', 'Basis'];
const ITEM_UNITS = ['', '', 'count', 'mm', 'mm', 'mm', 'm²'];
const HIDE_HEADER = ['Material', 'Area (m²)', 'Usable hide (m²)', 'Waste factor', 'Hides', '', '', 'Basis'];
const HIDE_UNITS = ['', 'm²', 'm²', '', 'count'];

export function addLeatherSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Leather');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  const { items, hides } = result.cutting.leather;
  ws.addRow([]);
  addHeading(ws, 'Straps and lashings');
  addHeaderRow(ws, ITEM_HEADER);
  for (const i of items) {
    const row = ws.addRow([i.item, i.material, i.quantity, i.width_mm, i.thickness_mm, i.length_mm, i.area_m2, i.basis]);
    finish(row, ITEM_UNITS, i.basis);
  }
  ws.addRow([]);
  addHeading(ws, 'Hides to buy');
  addHeaderRow(ws, HIDE_HEADER);
  for (const h of hides) {
    const row = ws.addRow([h.material, h.area_m2, h.usable_hide_m2, h.waste_factor, h.hides, null, null, h.basis]);
    finish(row, HIDE_UNITS, h.basis);
  }
}

function finish(row: ExcelJS.Row, units: readonly string[], basis: string): void {
  units.forEach((u, i) => {
    if (u) row.getCell(i + 1).numFmt = numFmtForUnit(u);
  });
  row.getCell(WIDTHS.length).alignment = { wrapText: true, vertical: 'top' };
  row.height = wrappedHeight([{ text: basis, width: WIDTHS.at(-1)! }]);
}
