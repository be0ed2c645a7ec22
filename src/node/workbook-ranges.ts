// The cell ranges in a workbook that the spreadsheet library expands cell
// by cell when it opens the file: merged cells, data validations and named
// ranges. A validation over a whole column (C3:C1048576, as a spreadsheet
// program writes it for a column selected whole) is a million entries; one
// over the whole grid, or a merge of it, never finishes or runs out of memory.
// Each range's area is counted here from its two corners, never cell by cell.

export interface Covering {
  /** What covers the cells, as a message names it. */
  what: 'a merge of cells' | 'a data validation' | 'a named range';
  ref: string;
  cells: number;
}

const MERGE = /<(?:\w+:)?mergeCell\b[^>]*\bref="([^"]*)"/g;
const VALIDATION = /<(?:\w+:)?dataValidation\b[^>]*\bsqref="([^"]*)"/g;
const DEFINED_NAME = /<(?:\w+:)?definedName\b[^>]*>([^<]*)</g;
const CORNER = /\$?([A-Za-z]{1,3})\$?(\d{1,7})/;
// A range of one or two corners, as written in a reference list or a formula.
const RANGE = /\$?[A-Za-z]{1,3}\$?\d{1,7}(?::\$?[A-Za-z]{1,3}\$?\d{1,7})?/g;

/** The merged cells and validations of a worksheet's XML. */
export function sheetCoverings(xml: string): Covering[] {
  const out: Covering[] = [];
  for (const m of xml.matchAll(MERGE)) out.push({ what: 'a merge of cells', ref: m[1], cells: areaOf(m[1]) });
  // A validation's sqref lists ranges separated by spaces.
  for (const m of xml.matchAll(VALIDATION)) out.push({ what: 'a data validation', ref: m[1], cells: m[1].split(/\s+/).reduce((n, r) => n + areaOf(r), 0) });
  return out;
}

/** The named ranges of the workbook part (xl/workbook.xml). */
export function namedCoverings(xml: string): Covering[] {
  return [...xml.matchAll(DEFINED_NAME)].map((m) => ({ what: 'a named range' as const, ref: m[1], cells: [...m[1].matchAll(RANGE)].reduce((n, r) => n + areaOf(r[0]), 0) }));
}

/** Cells in a range such as `B2:D4` (9) or `A1` (1); 0 for text that is no range. */
export function areaOf(ref: string): number {
  const [a, b = a] = ref.split(':');
  const p = corner(a);
  const q = corner(b);
  if (!p || !q) return 0;
  return (Math.abs(q.row - p.row) + 1) * (Math.abs(q.column - p.column) + 1);
}

function corner(text: string): { row: number; column: number } | undefined {
  const m = CORNER.exec(text);
  if (!m) return undefined;
  let column = 0;
  for (const ch of m[1].toUpperCase()) column = column * 26 + (ch.charCodeAt(0) - 64);
  return { row: Number(m[2]), column };
}
