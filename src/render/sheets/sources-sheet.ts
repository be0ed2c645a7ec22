import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { citationText } from '../../core/data/source-text.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

const WIDTHS = [26, 90];

export function addSourcesSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Sources');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  addHeaderRow(ws, ['Id', 'Source']);
  result.sources.forEach((s) => {
    const source = `${citationText(s)} (${s.kind})${s.note ? `. ${s.note}` : ''}`;
    const row = ws.addRow([s.id, source]);
    row.getCell(1).alignment = { vertical: 'top' };
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: source, width: WIDTHS[1] }]);
  });
}
