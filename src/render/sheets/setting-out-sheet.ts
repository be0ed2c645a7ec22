import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { DRAWING_NOTE, settingOutRows } from '../setting-out-rows.ts';
import { addCautionRow, addHeaderRow, addHeading, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

const WIDTHS = [44, 14, 8, 60];

export function addSettingOutSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Wheel setting-out');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  const w = result.cutting.setting_out;
  addHeaderRow(ws, ['Dimension (each wheel)', 'Value', 'Unit']);
  for (const r of settingOutRows(w)) {
    const row = ws.addRow([r.label, r.value ?? 'none (no tyre)', r.unit]);
    if (r.value !== null) row.getCell(2).numFmt = numFmtForUnit(r.unit);
  }
  ws.addRow([]);
  addHeading(ws, 'Basis');
  for (const line of w.basis) {
    const row = ws.addRow([line]);
    ws.mergeCells(row.number, 1, row.number, WIDTHS.length);
    row.getCell(1).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: line, width: sumOf(WIDTHS) }]);
  }
  ws.addRow([]);
  const note = ws.addRow([DRAWING_NOTE]);
  ws.mergeCells(note.number, 1, note.number, WIDTHS.length);
  note.getCell(1).font = { italic: true };
}
