import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { specValueText } from '../spec-value.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

const WIDTHS = [40, 24, 10, 10, 60];
const DEFAULTED_FONT: Partial<ExcelJS.Font> = { italic: true, color: { argb: 'FF808080' } };

export function addSpecSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Spec as checked', { views: [{ state: 'frozen', ySplit: 2 }] });
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  const header = addHeaderRow(ws, ['Path', 'Value', 'Unit', 'Default', 'Note']);

  for (const e of result.spec_as_checked) {
    // Finite numbers stay numbers so they can be reused; anything else is shown as text.
    const numeric = typeof e.value === 'number' && Number.isFinite(e.value);
    const value = numeric ? (e.value as number) : specValueText(e.value);
    const row = ws.addRow([e.path, value, e.unit, e.defaulted ? 'default' : null, e.note ?? null]);
    if (numeric) row.getCell(2).numFmt = numFmtForUnit(e.unit);
    row.getCell(5).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: e.note ?? '', width: WIDTHS[4] }]);
    if (e.defaulted) row.font = DEFAULTED_FONT;
  }

  ws.autoFilter = {
    from: { row: header.number, column: 1 },
    to: { row: Math.max(header.number, ws.rowCount), column: WIDTHS.length },
  };
}
