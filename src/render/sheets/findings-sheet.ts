import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { findingsWorstFirst } from '../severity-order.ts';
import { cellNumber, numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, solidFill, sumOf, wrappedHeight } from './sheet-style.ts';

const COLUMNS = [
  { label: 'Rule', width: 22 },
  { label: 'Code', width: 8 },
  { label: 'Severity', width: 11 },
  { label: 'Subject', width: 22 },
  { label: 'Value', width: 12 },
  { label: 'Unit', width: 8 },
  { label: 'Limit', width: 12 },
  { label: 'Utilisation', width: 12 },
  { label: 'Message', width: 48 },
  { label: 'Fix', width: 40 },
  { label: 'Source', width: 32 },
  { label: 'Working', width: 64 },
] as const;

/** Columns whose text wraps; the row is made tall enough for the longest. */
const WRAPPED = ['Subject', 'Message', 'Fix', 'Source', 'Working'];

export function addFindingsSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  // Caution and header stay in view while scrolling.
  const ws = wb.addWorksheet('Findings', { views: [{ state: 'frozen', ySplit: 2 }] });
  const widths = COLUMNS.map((c) => c.width);
  setColumnWidths(ws, widths);
  addCautionRow(ws, headlineCaution(result), COLUMNS.length, sumOf(widths));
  const header = addHeaderRow(ws, COLUMNS.map((c) => c.label));

  for (const f of findingsWorstFirst(result.findings)) {
    const row = ws.addRow([
      f.rule,
      f.code,
      f.severity,
      f.subject,
      cellNumber(f.value),
      f.unit,
      cellNumber(f.limit),
      cellNumber(f.utilisation),
      f.message,
      f.fix,
      f.sources.join('; '),
      f.working_text,
    ]);
    row.getCell(5).numFmt = numFmtForUnit(f.unit);
    row.getCell(7).numFmt = numFmtForUnit(f.unit);
    row.getCell(8).numFmt = '0.0%';
    const severity = row.getCell(3);
    severity.fill = solidFill(SEVERITY_COLOURS[f.severity].fill);
    severity.font = { bold: true };
    const wrapped: { text: string; width: number }[] = [];
    COLUMNS.forEach((c, i) => {
      const cell = row.getCell(i + 1);
      if (WRAPPED.includes(c.label)) {
        cell.alignment = { wrapText: true, vertical: 'top' };
        wrapped.push({ text: String(cell.value ?? ''), width: c.width });
      } else {
        cell.alignment = { vertical: 'top' };
      }
    });
    row.height = wrappedHeight(wrapped);
  }

  ws.autoFilter = {
    from: { row: header.number, column: 1 },
    to: { row: Math.max(header.number, ws.rowCount), column: COLUMNS.length },
  };
}
