import type ExcelJS from 'exceljs';
import type { RulesData } from '../../core/data/rules-data.ts';
import { choicesOf } from './choice-lists.ts';
import { specificationWorkbook } from './spec-sheets.ts';

/** The blank fill-in workbook kept in the repository, relative to its root. */
export const TEMPLATE_FILE = 'templates/specification.xlsx';

export function templateWorkbook(data: RulesData): ExcelJS.Workbook {
  const wb = specificationWorkbook(undefined, choicesOf(data));
  // A fixed date, so that a regenerated template differs only where its content does.
  wb.created = wb.modified = new Date('2024-01-01T00:00:00Z');
  return wb;
}
