// Where things sit in a specification workbook: shared by the writer and the
// reader, so that what one writes the other finds.
import type { Section, Table } from '../spec/spec-fields.ts';

/** Columns of a section sheet's key rows. */
export const COL = { key: 1, label: 2, value: 3, unit: 4, default: 5, help: 6 } as const;
export const TITLE_ROW = 1;
export const HEADER_ROW = 2;

/** A table's entries start in this column; column A numbers them. */
export const TABLE_FIRST_COL = 2;
/** Below a table's heading row: the header of keys, then a row of units and defaults, then entries. */
export const TABLE_HEADER_OFFSET = 1;
export const TABLE_ENTRY_OFFSET = 3;
/** Rows made ready (styled, validated) for a table without a maximum. */
export const TABLE_SPARE_ROWS = 20;

export const COVER_SHEET = 'Start here';
/** Hidden sheet holding the drop-down lists. */
export const LISTS_SHEET = 'Lists';

// Written into the workbook's properties: a check result carries its own
// sheets after the specification, which a reader passes over.
export const FILL_IN_CATEGORY = 'axletree specification';
export const RESULT_CATEGORY = 'axletree specification and check result';

/** The table's key as written in its heading cell: `crew`, `stock.lumber`. */
export function tableKey(section: Section, table: Table): string {
  return [...section.path, ...table.path].join('.');
}

/** A column's letters: 1 is A, 27 is AA. */
export function columnName(col: number): string {
  let letters = '';
  for (let c = col; c > 0; c = Math.floor((c - 1) / 26)) letters = String.fromCharCode(65 + ((c - 1) % 26)) + letters;
  return letters;
}

export function cellName(sheet: string, row: number, col: number): string {
  const letters = columnName(col);
  const quoted = /^[A-Za-z0-9_]+$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
  return `${quoted}!${letters}${row}`;
}
