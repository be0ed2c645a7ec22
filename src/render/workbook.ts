import ExcelJS from 'exceljs';
import type { CheckResult } from '../core/result/check-result.ts';
import type { ReportDocument } from './model/document.ts';
import { reportDocument } from './model/report-document.ts';
import { addSummarySheet } from './sheets/summary-sheet.ts';
import { addFindingsSheet } from './sheets/findings-sheet.ts';
import { addMassBalanceSheet } from './sheets/mass-balance-sheet.ts';
import { addLoadsSheet } from './sheets/loads-sheet.ts';
import { addRideSheet } from './sheets/ride-sheet.ts';
import { addCutListSheet } from './sheets/cut-list-sheet.ts';
import { addLeatherSheet } from './sheets/leather-sheet.ts';
import { addSettingOutSheet } from './sheets/setting-out-sheet.ts';
import { addStockPlanSheet } from './sheets/stock-plan-sheet.ts';
import { addSpecSheet } from './sheets/spec-sheet.ts';
import { addSourcesSheet } from './sheets/sources-sheet.ts';
import { addSpecificationSheets } from './spec-workbook/spec-sheets.ts';
import { opensOn } from './sheets/opens-on.ts';
import { steadyWorkbookBytes } from './steady-bytes.ts';
import type { DeflateRaw } from './zip-deflate.ts';

/**
 * The check result as an .xlsx workbook, returned as bytes; the caller writes
 * it. The sheets' tables are the report model's, so the workbook says what the
 * Markdown and HTML reports say; pass the model the reports were made from.
 * It opens on the summary; the findings follow, then the evidence, and the
 * specification's fill-in sheets come last. Every sheet is set up to print.
 * The same result always gives the same bytes. `deflateRaw`: see steadyWorkbookBytes.
 */
export async function renderWorkbook(result: CheckResult, doc: ReportDocument = reportDocument(result), deflateRaw?: DeflateRaw): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  wb.creator = `${result.tool.name} ${result.tool.version}`;
  wb.title = doc.title;
  const summary = addSummarySheet(wb, doc, result);
  addFindingsSheet(wb, doc);
  addMassBalanceSheet(wb, doc);
  addLoadsSheet(wb, doc);
  addRideSheet(wb, doc);
  addCutListSheet(wb, doc);
  addLeatherSheet(wb, doc);
  addSettingOutSheet(wb, doc);
  addStockPlanSheet(wb, doc, result);
  addSpecSheet(wb, doc);
  addSourcesSheet(wb, doc);
  if (result.input !== undefined) addSpecificationSheets(wb, result.input, result.choices);
  opensOn(wb, summary);
  return steadyWorkbookBytes(wb, deflateRaw);
}
