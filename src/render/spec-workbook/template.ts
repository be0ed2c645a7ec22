import type ExcelJS from 'exceljs';
import type { RulesData } from '../../core/data/rules-data.ts';
import { steadyWorkbookBytes } from '../steady-bytes.ts';
import { choicesOf } from './choice-lists.ts';
import { specificationWorkbook } from './spec-sheets.ts';

/** The blank fill-in workbook kept in the repository, relative to its root. */
export const TEMPLATE_FILE = 'templates/specification.xlsx';

export function templateWorkbook(data: RulesData): ExcelJS.Workbook {
  return specificationWorkbook(undefined, choicesOf(data));
}

/** The template's bytes: fixed dates, so a regenerated template differs only where its content does. */
export function templateBytes(data: RulesData): Promise<Uint8Array> {
  return steadyWorkbookBytes(templateWorkbook(data));
}
