import type ExcelJS from 'exceljs';
import type { ChoiceTable } from '../../core/spec/spec-fields.ts';
import type { Choices } from '../../core/data/choices.ts';
import { LISTS_SHEET } from '../../core/input/workbook-layout.ts';

export { choicesOf, type Choices } from '../../core/data/choices.ts';

const TABLES: readonly ChoiceTable[] = ['species', 'leathers', 'grounds'];

/**
 * Where each list sits in the hidden lists sheet, one column each: a list
 * written into the validation itself is capped at 255 characters, which the
 * species list would outgrow.
 */
export function listRanges(choices: Choices): Record<ChoiceTable, string> {
  const ranges = {} as Record<ChoiceTable, string>;
  TABLES.forEach((table, i) => {
    const letter = String.fromCharCode(65 + i);
    ranges[table] = `${LISTS_SHEET}!$${letter}$2:$${letter}$${Math.max(2, choices[table].length + 1)}`;
  });
  return ranges;
}

export function addListsSheet(wb: ExcelJS.Workbook, choices: Choices): void {
  const ws = wb.addWorksheet(LISTS_SHEET, { state: 'hidden' });
  TABLES.forEach((table, i) => [table, ...choices[table]].forEach((v, r) => (ws.getCell(r + 1, i + 1).value = v)));
}
