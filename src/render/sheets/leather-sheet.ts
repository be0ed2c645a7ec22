import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { tablesSheet } from './report-sheet.ts';

/** The straps and lashings, and the hides to buy for them. */
export function addLeatherSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const { ws } = tablesSheet(wb, 'Leather', doc, [
    { heading: 'Straps and lashings', table: tableById(doc, 'leather-items') },
    { heading: 'Hides to buy', table: tableById(doc, 'hides') },
  ]);
  setPrint(ws);
}
