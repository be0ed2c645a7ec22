import type ExcelJS from 'exceljs';
import { font, solidFill } from '../sheets/sheet-style.ts';
import { INPUT_EDGE, INPUT_FILL as INPUT_COLOUR, LABEL_FILL as LABEL_COLOUR, QUIET_INK } from '../sheets/sheet-palette.ts';
import { toArgb } from '../severity-palette.ts';

// Input cells are near-white cream inside an olive border; labels, help and
// computed cells are a barely tinted grey without one, so a planner sees at
// once where to type, on screen or printed in grey.
export const INPUT_FILL = solidFill(INPUT_COLOUR);
export const LABEL_FILL = solidFill(LABEL_COLOUR);
const EDGE = { style: 'thin', color: { argb: toArgb(INPUT_EDGE) } } as const;
const INPUT_BORDER: Partial<ExcelJS.Borders> = { top: EDGE, bottom: EDGE, left: EDGE, right: EDGE };

export function styleInput(cell: ExcelJS.Cell): void {
  cell.fill = INPUT_FILL;
  cell.border = INPUT_BORDER;
  // Level with the first line of its label and help.
  cell.alignment = { vertical: 'top' };
}

export function styleLabel(cell: ExcelJS.Cell): void {
  cell.fill = LABEL_FILL;
  cell.alignment = { wrapText: true, vertical: 'top' };
}

export const REQUIRED_FONT = font({ bold: true });
export const QUIET_FONT = font({ italic: true, color: { argb: toArgb(QUIET_INK) } });
