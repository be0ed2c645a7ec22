import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

// Sizes stay numbers, one column per dimension, so a planner can reuse them.
const COLUMNS = [
  { label: 'Part', width: 26, unit: '' },
  { label: 'Qty', width: 6, unit: 'count' },
  { label: 'Spares', width: 8, unit: 'count' },
  { label: 'Species', width: 14, unit: '' },
  { label: 'Finished L (mm)', width: 10, unit: 'mm' },
  { label: 'Finished W (mm)', width: 10, unit: 'mm' },
  { label: 'Finished T (mm)', width: 10, unit: 'mm' },
  { label: 'Rough L (mm)', width: 10, unit: 'mm' },
  { label: 'Rough W (mm)', width: 10, unit: 'mm' },
  { label: 'Rough T (mm)', width: 10, unit: 'mm' },
  { label: 'Grain', width: 22, unit: '' },
  { label: 'Steam-bent', width: 10, unit: '' },
  { label: 'Volume, one piece rough (m³)', width: 13, unit: 'm³' },
  { label: 'Mass, one piece finished (kg)', width: 13, unit: 'kg' },
  { label: 'Basis', width: 60, unit: '' },
] as const;

export function addCutListSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Cut list', { views: [{ state: 'frozen', ySplit: 2 }] });
  const widths = COLUMNS.map((c) => c.width);
  setColumnWidths(ws, widths);
  addCautionRow(ws, headlineCaution(result), COLUMNS.length, sumOf(widths));
  addHeaderRow(ws, COLUMNS.map((c) => c.label));
  const items = result.cutting.cut_list;
  for (const c of items) {
    const row = ws.addRow([
      c.part, c.quantity, c.spares, c.species,
      c.finished.length_mm, c.finished.width_mm, c.finished.thickness_mm,
      c.rough.length_mm, c.rough.width_mm, c.rough.thickness_mm,
      c.grain, c.steam_bent ? 'yes' : 'no', c.volume_m3, c.mass_kg, c.basis,
    ]);
    formatColumns(row);
    row.getCell(COLUMNS.length).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: c.basis, width: widths.at(-1)! }]);
  }
  // Rough volume counts spares (they are bought); finished mass does not (they are not fitted).
  const volume = items.reduce((s, c) => s + c.volume_m3 * (c.quantity + c.spares), 0);
  const mass = items.reduce((s, c) => s + c.mass_kg * c.quantity, 0);
  const total = ws.addRow(['Total: rough volume with spares; finished mass of the parts fitted']);
  total.getCell(13).value = volume;
  total.getCell(14).value = mass;
  formatColumns(total);
  total.font = { bold: true };
}

function formatColumns(row: ExcelJS.Row): void {
  COLUMNS.forEach((c, i) => {
    if (c.unit) row.getCell(i + 1).numFmt = numFmtForUnit(c.unit);
  });
}
