import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { filterFrom, tablesSheet } from './report-sheet.ts';

/** The graded findings worst first, filterable, then the notes apart; every column of the model's tables. */
export function addFindingsSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  // Caution and header stay in view while scrolling; the filter covers the graded findings.
  const { ws, widths, headers } = tablesSheet(wb, 'Findings', doc, [
    { table: tableById(doc, 'findings') },
    { heading: 'Notes: they inform, grade nothing and never count towards the verdict', table: tableById(doc, 'notes') },
  ], { frozen: true });
  filterFrom(ws, headers[0], widths.length);
}
