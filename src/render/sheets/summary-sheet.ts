import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { countBySeverity, SEVERITIES_WORST_FIRST } from '../severity-order.ts';
import { cellNumber, numFmtForUnit } from '../number-format.ts';
import { headlineCaution, requireCautions } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, addHeading, setColumnWidths, solidFill, sumOf, wrappedHeight } from './sheet-style.ts';

const WIDTHS = [36, 22, 12, 50];

export function addSummarySheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Summary');
  setColumnWidths(ws, WIDTHS);
  const span = WIDTHS.length;
  addCautionRow(ws, headlineCaution(result), span, sumOf(WIDTHS));
  ws.addRow([]);

  const title = ws.addRow([`Design-rule check: ${result.spec_name}`]);
  ws.mergeCells(title.number, 1, title.number, span);
  title.getCell(1).font = { bold: true, size: 16 };
  ws.addRow(['Checked by', `${result.tool.name} ${result.tool.version}`]);
  ws.addRow([]);

  const verdict = ws.addRow(['Verdict', result.verdict.toUpperCase()]);
  verdict.height = 40;
  verdict.getCell(1).font = { bold: true, size: 16 };
  verdict.getCell(1).alignment = { vertical: 'middle' };
  const word = verdict.getCell(2);
  word.font = { bold: true, size: 28 };
  word.fill = solidFill(SEVERITY_COLOURS[result.verdict].fill);
  word.alignment = { horizontal: 'center', vertical: 'middle' };
  ws.addRow([]);

  addHeading(ws, 'Cautions');
  for (const caution of requireCautions(result)) {
    const row = ws.addRow([caution]);
    ws.mergeCells(row.number, 1, row.number, span);
    const cell = row.getCell(1);
    cell.font = { bold: true, size: 12 };
    cell.fill = solidFill('#FFF2CC');
    cell.alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: caution, width: sumOf(WIDTHS) * 0.9 }]) + 4;
  }
  ws.addRow([]);

  addHeading(ws, 'Findings by severity');
  const counts = countBySeverity(result.findings);
  for (const s of SEVERITIES_WORST_FIRST) {
    const row = ws.addRow([s, counts[s]]);
    row.getCell(1).fill = solidFill(SEVERITY_COLOURS[s].fill);
  }
  ws.addRow(['total', result.findings.length]).getCell(1).font = { bold: true };
  ws.addRow([]);

  addHeading(ws, 'Key figures');
  addHeaderRow(ws, ['Figure', 'Value', 'Unit']);
  for (const [name, fig] of Object.entries(result.figures)) {
    const row = ws.addRow([name, cellNumber(fig.value), fig.unit]);
    row.getCell(2).numFmt = numFmtForUnit(fig.unit);
  }
}
