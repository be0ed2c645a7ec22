import ExcelJS from 'exceljs';
import { specSections, type Section } from '../../core/spec/spec-fields.ts';
import { addListsSheet, listRanges, type Choices } from './choice-lists.ts';
import { addCoverSheet } from './cover-sheet.ts';
import { FILL_IN_CATEGORY, RESULT_CATEGORY } from '../../core/input/workbook-layout.ts';
import { addSectionSheet } from './section-sheet.ts';
import { blankSpec, valueAt } from '../../core/input/spec-values.ts';
import { pathText, type KeyPath } from '../../core/spec/input-issue.ts';
import { steadyWorkbookBytes } from '../steady-bytes.ts';

function addAll(wb: ExcelJS.Workbook, raw: unknown, choices: Choices): void {
  const sections = specSections();
  addCoverSheet(wb, sections);
  const ranges = listRanges(choices);
  for (const s of sections) addSectionSheet(wb, s, valueAt(raw, s.path), (t) => ranges[t]);
  addListsSheet(wb, choices);
}

/**
 * The specification sheets at the head of a check's result workbook, so one
 * file carries the inputs and the verdict; read again, only these are read.
 */
export function addSpecificationSheets(wb: ExcelJS.Workbook, raw: unknown, choices: Choices): void {
  addAll(wb, raw, choices);
  wb.category = RESULT_CATEGORY;
}

/** A fill-in workbook: blank, or holding the values of a specification (its name in the title every printed page carries). */
export function specificationWorkbook(raw: unknown, choices: Choices): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  const name = valueAt(raw, ['name']);
  wb.creator = 'axletree';
  wb.title = typeof name === 'string' && name !== '' ? `Chariot build specification: ${name}` : 'Chariot build specification';
  wb.category = FILL_IN_CATEGORY;
  addAll(wb, raw ?? blankSpec(specSections()), choices);
  return wb;
}

/** The fill-in workbook as bytes, the same for the same specification whenever it is written. */
export function specificationWorkbookBytes(raw: unknown, choices: Choices): Promise<Uint8Array> {
  return steadyWorkbookBytes(specificationWorkbook(raw, choices));
}

/** Keys of a specification that no cell of the workbook would hold (unknown keys). */
export function unplacedKeys(raw: unknown, sections: readonly Section[] = specSections()): string[] {
  const known = new Set<string>();
  for (const s of sections) {
    for (const f of s.fields) known.add([...s.path, ...f.path].join('.'));
    for (const t of s.tables) for (const f of t.fields) known.add([...s.path, ...t.path, '*', ...f.path].join('.'));
  }
  const out: string[] = [];
  const walk = (node: unknown, path: KeyPath) => {
    const key = path.map((p) => (typeof p === 'number' ? '*' : p)).join('.');
    if (known.has(key)) return;
    if (typeof node === 'object' && node !== null) {
      for (const [k, v] of Object.entries(node)) walk(v, [...path, Array.isArray(node) ? Number(k) : k]);
      // An empty object or list given on its own holds nothing to place.
      return;
    }
    out.push(pathText(path));
  };
  walk(raw, []);
  return out;
}
