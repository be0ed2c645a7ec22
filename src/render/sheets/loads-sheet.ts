import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { tablesSheet } from './report-sheet.ts';

/** Every load the models computed, by model, part and load case. */
export function addLoadsSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  setPrint(tablesSheet(wb, 'Loads', doc, [{ table: tableById(doc, 'loads') }], { frozen: true }).ws);
}
