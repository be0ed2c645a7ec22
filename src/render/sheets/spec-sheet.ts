import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { filterFrom, tablesSheet } from './report-sheet.ts';

/** Every value the check used, filterable; defaults set apart in grey italics. */
export function addSpecSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const { ws, widths, headers } = tablesSheet(wb, 'Spec as checked', doc, [{ table: tableById(doc, 'spec') }], { frozen: true });
  filterFrom(ws, headers[0], widths.length);
  setPrint(ws);
}
