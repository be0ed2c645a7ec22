import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, sumOf } from './sheet-style.ts';

const WIDTHS = [12, 34, 30, 26, 14, 10];

/** Every load the models computed, by family, part and load case. */
export function addLoadsSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Loads');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  addHeaderRow(ws, ['Model', 'Part', 'Load case', 'Quantity', 'Value', 'Unit']);
  for (const l of result.loads) {
    const row = ws.addRow([l.group, l.item, l.case, l.quantity, l.value, l.unit]);
    row.getCell(5).numFmt = numFmtForUnit(l.unit);
  }
}
