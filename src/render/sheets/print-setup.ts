import type ExcelJS from 'exceljs';
import { sumOf } from './sheet-style.ts';

// Every sheet prints on A4, one page wide and as many long as it needs, with
// its header rows repeated, the workbook's title (which names the
// specification) and the sheet at the top and the page counted at the bottom.

/**
 * Portrait A4 between our margins, in column width units (one unit is a
 * digit's width, 7 px at 96 px to the inch, and each column 5 px more).
 */
const PORTRAIT_WIDTH = 101;
const A4 = 9;
/** Inches; narrow, so that more of the sheet fits at a readable size. */
const MARGINS: ExcelJS.Margins = { left: 0.4, right: 0.4, top: 0.55, bottom: 0.5, header: 0.2, footer: 0.2 };

export interface PrintOptions {
  /** The last row and column to print; by default the last that hold a value or a fill. */
  lastRow?: number;
  lastColumn?: number;
  /** The rows repeated at the top of each page; by default those frozen on screen, else the first. */
  titleRows?: number;
  /** A line for the page header's right, where the paper leaves something out. */
  note?: string;
}

/** A page header holds at most 255 characters in all; a longer name is cut. */
const MAX_NAME = 100;

/** Text for a page header or footer: `&` is a control character there, written twice to stand for itself. */
function headerText(text: string): string {
  return text.replaceAll('&', '&&');
}

/** The bottom-right cell that holds a value or a fill, so that a bar of fills is printed whole. */
export function usedExtent(ws: ExcelJS.Worksheet): { rows: number; columns: number } {
  let rows = 1;
  let columns = 1;
  ws.eachRow((row) =>
    row.eachCell((cell, col) => {
      const filled = cell.fill?.type === 'pattern' && cell.fill.pattern === 'solid';
      if (cell.value === null && !filled) return;
      rows = Math.max(rows, row.number);
      columns = Math.max(columns, col);
    }),
  );
  return { rows, columns };
}

function frozenRows(ws: ExcelJS.Worksheet): number {
  const view = ws.views[0];
  return view?.state === 'frozen' ? (view.ySplit ?? 0) : 0;
}

/** A column's letters: 1 is A, 27 is AA. */
export function columnLetters(n: number): string {
  let out = '';
  for (let c = n; c > 0; c = Math.floor((c - 1) / 26)) out = String.fromCharCode(65 + ((c - 1) % 26)) + out;
  return out;
}

/** The widths of the first `n` columns, as set (a column never set has the default width). */
function printedWidth(ws: ExcelJS.Worksheet, n: number): number {
  return sumOf(Array.from({ length: n }, (_, i) => ws.getColumn(i + 1).width ?? 9));
}

/** Below this scale, portrait print is too small to read comfortably (11 pt type becomes 7.7 pt). */
const SMALLEST_PORTRAIT_SCALE = 0.7;

/** Portrait, unless fitting the columns across it would shrink the type below a comfortable size: then landscape. */
export function orientationFor(width: number): 'portrait' | 'landscape' {
  return PORTRAIT_WIDTH / width < SMALLEST_PORTRAIT_SCALE ? 'landscape' : 'portrait';
}

/** A4, fit to one page's width, landscape where the sheet is wide; header rows repeated; named and numbered pages. */
export function setPrint(ws: ExcelJS.Worksheet, o: PrintOptions = {}): void {
  const used = usedExtent(ws);
  const lastRow = o.lastRow ?? used.rows;
  const lastColumn = o.lastColumn ?? used.columns;
  const titles = Math.min(o.titleRows ?? (frozenRows(ws) || 1), lastRow);
  ws.pageSetup = {
    ...ws.pageSetup,
    paperSize: A4,
    orientation: orientationFor(printedWidth(ws, lastColumn)),
    fitToPage: true,
    fitToWidth: 1,
    fitToHeight: 0,
    margins: MARGINS,
    // Absolute rows too: a print area is a defined name, and a relative row would move with the cursor.
    printArea: `A$1:${columnLetters(lastColumn)}$${lastRow}`,
    printTitlesRow: `1:${titles}`,
  };
  ws.headerFooter = {
    ...ws.headerFooter,
    oddHeader: `&L${headerText(ws.workbook.title.slice(0, MAX_NAME))}&C&"-,Bold"&A${o.note ? `&R${headerText(o.note)}` : ''}`,
    oddFooter: '&RPage &P of &N',
  };
}
