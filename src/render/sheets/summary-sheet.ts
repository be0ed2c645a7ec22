import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { ReportDocument, TableBlock } from '../model/document.ts';
import { sectionById, tableById } from '../model/find-table.ts';
import { runsText } from '../model/runs-text.ts';
import { blocksOf, reportSheet } from './report-sheet.ts';
import { addHeading, addMergedLine, font, styleCaution, styleSeverity, sumOf, wrappedHeight } from './sheet-style.ts';
import { addModelTable } from './sheet-table.ts';
import { highestUtilisations } from './highest-utilisations.ts';
import { setPrint } from './print-setup.ts';

/** The decisive-inputs table with the lines around it, where the check searched for them. */
function decisiveParts(doc: ReportDocument): { table: TableBlock; lines: string[] } | undefined {
  const section = sectionById(doc, 'decisive');
  const table = section ? blocksOf(section.blocks, 'table').find((t) => t.id === 'decisive-inputs') : undefined;
  if (!section || !table) return undefined;
  return { table, lines: blocksOf(section.blocks, 'paragraph').map((p) => runsText(p.runs)) };
}

/**
 * The sheet the workbook opens on: the verdict, the cautions in full, the
 * three highest utilisations, the inputs the verdict hangs on (where they
 * were searched for), what each severity means with its count, and the key figures.
 */
export function addSummarySheet(wb: ExcelJS.Workbook, doc: ReportDocument, result: CheckResult): ExcelJS.Worksheet {
  const verdict = sectionById(doc, 'verdict');
  const cautions = blocksOf(sectionById(doc, 'cautions')?.blocks ?? [], 'cautions').flatMap((b) => b.items);
  if (!verdict?.badge || cautions.length === 0) throw new Error('the report has no verdict or no cautions; refusing to write its summary');
  const highest = highestUtilisations(result);
  const decisive = decisiveParts(doc);
  const severities = tableById(doc, 'severities');
  const figures = tableById(doc, 'figures');
  const tables = [highest, ...(decisive ? [decisive.table] : []), severities, figures];
  const { ws, widths } = reportSheet(wb, 'Summary', doc, tables, { widths: [24, 14, 40] });
  ws.addRow([]);

  const title = addMergedLine(ws, doc.title, widths);
  title.getCell(1).font = font({ bold: true, size: 16 });
  title.height = 24;
  for (const p of blocksOf(verdict.blocks, 'paragraph')) addMergedLine(ws, runsText(p.runs), widths);
  for (const l of blocksOf(verdict.blocks, 'list')) for (const item of l.items) addMergedLine(ws, `- ${runsText(item)}`, widths);
  ws.addRow([]);

  const row = ws.addRow(['Verdict', verdict.badge.toUpperCase()]);
  row.height = 40;
  row.getCell(1).font = font({ bold: true, size: 16 });
  row.getCell(1).alignment = { vertical: 'middle' };
  ws.mergeCells(row.number, 2, row.number, 3);
  const word = row.getCell(2);
  styleSeverity(word, verdict.badge, 28);
  word.alignment = { horizontal: 'center', vertical: 'middle' };
  ws.addRow([]);

  addHeading(ws, 'Cautions');
  for (const caution of cautions) {
    const line = addMergedLine(ws, caution, widths);
    styleCaution(line.getCell(1), 12);
    line.height = wrappedHeight([{ text: caution, width: sumOf(widths) * 0.9 }]) + 4;
  }
  ws.addRow([]);

  addHeading(ws, 'Highest utilisations: demand over capacity, with the load case and combination each was checked in');
  addModelTable(ws, highest, widths);
  if (decisive) {
    ws.addRow([]);
    addHeading(ws, 'What the verdict hangs on: the estimates, defaults and remembered values that would change a decisive finding');
    const [intro, ...rest] = decisive.lines;
    if (intro) addMergedLine(ws, intro, widths);
    addModelTable(ws, decisive.table, widths);
    for (const line of rest) addMergedLine(ws, line, widths);
  }
  ws.addRow([]);

  addHeading(ws, 'Findings by severity, and what each severity means');
  addModelTable(ws, severities, widths);
  ws.addRow([]);
  addHeading(ws, 'Key figures');
  addModelTable(ws, figures, widths);
  setPrint(ws, { titleRows: 1 });
  return ws;
}
