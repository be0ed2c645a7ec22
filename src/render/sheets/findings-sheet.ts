import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { filterFrom, tablesSheet } from './report-sheet.ts';
import { columnLetters, setPrint } from './print-setup.ts';
import { sheetHeaders } from './sheet-table.ts';

/** Narrower than other sheets' columns, so that the printed columns fit across a landscape page at a readable size. */
const FINDINGS_MAX_WIDTH = 30;

/** The trailing columns kept on screen but not on paper: the sources and the working. */
const OFF_PAPER = ['Sources', 'Working'];

/** How many columns print: all but the off-paper ones, where they end the table. */
function printedCount(headers: readonly string[]): number | undefined {
  const cut = headers.findIndex((h) => OFF_PAPER.includes(h));
  return cut > 0 && headers.slice(cut).every((h) => OFF_PAPER.includes(h)) ? cut : undefined;
}

/**
 * The graded findings worst first, filterable, then the notes apart; every
 * column of the model's tables. The working runs to thousands of lines over
 * a whole check: it and the sources stay in their columns on screen and are
 * left off the paper (the HTML report sets both out in full), so the
 * findings print in a few pages at a readable size.
 */
export function addFindingsSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const findings = tableById(doc, 'findings');
  const headers = sheetHeaders(findings);
  const printedColumns = printedCount(headers);
  // Caution and header stay in view while scrolling; the filter covers the graded findings.
  const sheet = tablesSheet(wb, 'Findings', doc, [
    { table: findings },
    { heading: 'Notes: they inform, grade nothing and never count towards the verdict', table: tableById(doc, 'notes') },
  ], { frozen: true, printedColumns, maxWidth: FINDINGS_MAX_WIDTH });
  filterFrom(sheet.ws, sheet.headers[0], sheet.widths.length);
  const off = printedColumns === undefined ? '' : `${columnLetters(printedColumns + 1)}-${columnLetters(headers.length)}`;
  setPrint(sheet.ws, printedColumns === undefined ? {} : { lastColumn: printedColumns, note: `Not printed: ${headers.slice(printedColumns).join(' and ').toLowerCase()} (columns ${off}; in full in the HTML report)` });
}
