import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { tablesSheet } from './report-sheet.ts';

/** The parts with their totals, and the load cases with their working. */
export function addMassBalanceSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const { ws } = tablesSheet(wb, 'Mass and balance', doc, [
    { heading: 'Parts', table: tableById(doc, 'parts') },
    { heading: 'Load cases', table: tableById(doc, 'load-cases') },
  ]);
  setPrint(ws);
}
