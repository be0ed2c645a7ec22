import ExcelJS from 'exceljs';
import type { CheckResult } from '../core/result/check-result.ts';
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

/** The check result as an .xlsx workbook, returned as bytes; the caller writes it. */
export async function renderWorkbook(result: CheckResult): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = `${result.tool.name} ${result.tool.version}`;
  wb.title = `Design-rule check: ${result.spec_name}`;
  if (result.input !== undefined) addSpecificationSheets(wb, result.input, result.choices);
  addSummarySheet(wb, result);
  addFindingsSheet(wb, result);
  addMassBalanceSheet(wb, result);
  addLoadsSheet(wb, result);
  addRideSheet(wb, result);
  addCutListSheet(wb, result);
  addLeatherSheet(wb, result);
  addSettingOutSheet(wb, result);
  addStockPlanSheet(wb, result);
  addSpecSheet(wb, result);
  addSourcesSheet(wb, result);
  const bytes = await wb.xlsx.writeBuffer();
  return Buffer.from(bytes as ArrayBuffer);
}
