// Builds specification workbooks for tests and finds cells in them by what
// the sheet itself says (the key column and the table headers), so expected
// cell names come from the workbook, not from the code that lays it out.
import ExcelJS from 'exceljs';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../../src/node/load-rules-data.ts';
import { choicesOf } from '../../src/render/spec-workbook/choice-lists.ts';
import { specificationWorkbook } from '../../src/render/spec-workbook/spec-sheets.ts';
import { REPO } from './run-cli.ts';

export const CHOICES = choicesOf(loadRulesData(defaultRulesDir()));

export function demoRaw(name = 'demo-two-crew.yaml'): Record<string, unknown> {
  return parse(readFileSync(join(REPO, 'specs', name), 'utf8'));
}

/** A workbook as a spreadsheet program would hand it back: written and loaded again. */
export async function reloaded(wb: ExcelJS.Workbook): Promise<ExcelJS.Workbook> {
  const out = new ExcelJS.Workbook();
  await out.xlsx.load(await wb.xlsx.writeBuffer());
  return out;
}

export async function demoWorkbook(name?: string): Promise<ExcelJS.Workbook> {
  return reloaded(specificationWorkbook(demoRaw(name), CHOICES));
}

/** The value cell of the row whose key column reads `key`. */
export function valueCell(wb: ExcelJS.Workbook, sheet: string, key: string): ExcelJS.Cell {
  const ws = wb.getWorksheet(sheet)!;
  for (let r = 1; r <= ws.rowCount; r++) {
    if (ws.getCell(r, 1).value === key) {
      const header = ws.getRow(2).values as unknown[];
      return ws.getCell(r, header.indexOf('Value'));
    }
  }
  throw new Error(`no row ${key} in ${sheet}`);
}

/** The cell of entry `index` (0-based, counting filled rows) under column `key` of the table headed `table`. */
export function tableCell(wb: ExcelJS.Workbook, sheet: string, table: string, index: number, key: string): ExcelJS.Cell {
  const ws = wb.getWorksheet(sheet)!;
  for (let r = 1; r <= ws.rowCount; r++) {
    if (ws.getCell(r, 1).value !== table) continue;
    const col = (ws.getRow(r + 1).values as unknown[]).indexOf(key);
    const entries: number[] = [];
    for (let e = r + 3; e <= ws.rowCount && entries.length <= index; e++) if (ws.getCell(e, col).value !== null) entries.push(e);
    return ws.getCell(entries[index], col);
  }
  throw new Error(`no table ${table} in ${sheet}`);
}

export function cellLabel(sheet: string, cell: ExcelJS.Cell): string {
  return `${/^\w+$/.test(sheet) ? sheet : `'${sheet}'`}!${cell.address}`;
}
