import type ExcelJS from 'exceljs';
import type { RulesData } from '../../src/data/rules-data.ts';
import type { ChoiceTable } from '../../src/spec/spec-fields.ts';
import { defaultRulesDir, loadRulesData } from '../load-rules-data.ts';
import { LISTS_SHEET } from './layout.ts';

/** The ids a planner may choose from, by rules-data table. */
export type Choices = Record<ChoiceTable, string[]>;

export function choicesOf(data: RulesData): Choices {
  return { species: Object.keys(data.species), leathers: Object.keys(data.leathers), grounds: Object.keys(data.grounds) };
}

let cached: Choices | undefined;
/** The choices of the repository's own rules data, read once. */
export function defaultChoices(): Choices {
  cached ??= choicesOf(loadRulesData(defaultRulesDir()));
  return cached;
}

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
