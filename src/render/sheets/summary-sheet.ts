import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { sectionById, tableById } from '../model/find-table.ts';
import { runsText } from '../model/runs-text.ts';
import { SEVERITY_COLOURS } from '../severity-palette.ts';
import { blocksOf, reportSheet } from './report-sheet.ts';
import { addHeading, addMergedLine, solidFill, sumOf, wrappedHeight } from './sheet-style.ts';
import { addModelTable } from './sheet-table.ts';

/** The verdict, the cautions in full, what each severity means with its count, and the key figures. */
export function addSummarySheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const verdict = sectionById(doc, 'verdict');
  const cautions = blocksOf(sectionById(doc, 'cautions')?.blocks ?? [], 'cautions').flatMap((b) => b.items);
  if (!verdict?.badge || cautions.length === 0) throw new Error('the report has no verdict or no cautions; refusing to write its summary');
  const severities = tableById(doc, 'severities');
  const figures = tableById(doc, 'figures');
  const { ws, widths } = reportSheet(wb, 'Summary', doc, [severities, figures], { widths: [24, 14, 60] });
  ws.addRow([]);

  const title = addMergedLine(ws, doc.title, widths);
  title.getCell(1).font = { bold: true, size: 16 };
  title.height = 24;
  for (const p of blocksOf(verdict.blocks, 'paragraph')) addMergedLine(ws, runsText(p.runs), widths);
  ws.addRow([]);

  const row = ws.addRow(['Verdict', verdict.badge.toUpperCase()]);
  row.height = 40;
  row.getCell(1).font = { bold: true, size: 16 };
  row.getCell(1).alignment = { vertical: 'middle' };
  const word = row.getCell(2);
  word.font = { bold: true, size: 28 };
  word.fill = solidFill(SEVERITY_COLOURS[verdict.badge].fill);
  word.alignment = { horizontal: 'center', vertical: 'middle' };
  ws.addRow([]);

  addHeading(ws, 'Cautions');
  for (const caution of cautions) {
    const line = addMergedLine(ws, caution, widths);
    line.getCell(1).font = { bold: true, size: 12 };
    line.getCell(1).fill = solidFill('#FFF2CC');
    line.height = wrappedHeight([{ text: caution, width: sumOf(widths) * 0.9 }]) + 4;
  }
  ws.addRow([]);

  addHeading(ws, 'Findings by severity, and what each severity means');
  addModelTable(ws, severities, widths);
  ws.addRow([]);
  addHeading(ws, 'Key figures');
  addModelTable(ws, figures, widths);
}
