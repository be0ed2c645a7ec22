import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { tablesSheet } from './report-sheet.ts';

/** The catalogue entry of every source cited, by the id the findings name. */
export function addSourcesSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  tablesSheet(wb, 'Sources', doc, [{ table: tableById(doc, 'sources') }]);
}
