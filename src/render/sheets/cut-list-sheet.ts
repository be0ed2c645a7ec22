import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { tablesSheet } from './report-sheet.ts';

/** Every part to cut; sizes stay numbers, one column per dimension, so a planner can reuse them. */
export function addCutListSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  setPrint(tablesSheet(wb, 'Cut list', doc, [{ table: tableById(doc, 'cut-list') }], { frozen: true }).ws);
}
