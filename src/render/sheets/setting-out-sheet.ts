import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { sectionById, tableById } from '../model/find-table.ts';
import { stepLine } from '../model/cell-text.ts';
import { SETTING_OUT_SVG_FILE } from '../report-figures.ts';
import { blocksOf, tablesSheet } from './report-sheet.ts';
import { addHeading, addMergedLine, font } from './sheet-style.ts';
import { setPrint } from './print-setup.ts';

/** Where the drawing is, since a spreadsheet cell cannot hold it. */
export const DRAWING_NOTE = `The dimensioned drawing is in the report: inline in report.html, and as ${SETTING_OUT_SVG_FILE} beside report.md.`;

/** Every dimension the wheelwright marks out, how they were found, and where the drawing is. */
export function addSettingOutSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const { ws, widths } = tablesSheet(wb, 'Wheel setting-out', doc, [{ table: tableById(doc, 'setting-out') }]);
  const basis = blocksOf(sectionById(doc, 'settingOut')?.blocks ?? [], 'working').flatMap((w) => w.steps.map(stepLine));
  const line = (text: string) => addMergedLine(ws, text, widths);
  ws.addRow([]);
  addHeading(ws, 'Basis');
  basis.forEach(line);
  ws.addRow([]);
  line(DRAWING_NOTE).getCell(1).font = font({ italic: true });
  setPrint(ws);
}
