import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { NARROW_TEXT, tablesSheet } from './report-sheet.ts';

/** The catalogue entry of every source cited, by the id the findings name; the long texts wrap narrow, so the sheet prints upright. */
export function addSourcesSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  setPrint(tablesSheet(wb, 'Sources', doc, [{ table: tableById(doc, 'sources') }], { frozen: true, maxWidth: NARROW_TEXT }).ws);
}
