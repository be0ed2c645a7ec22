import type ExcelJS from 'exceljs';
import { solidFill } from '../sheets/sheet-style.ts';

// Input cells are pale green with a border; labels, help and computed cells
// stay grey, so a planner sees at once where to type.
export const INPUT_FILL = solidFill('#E2EFDA');
export const LABEL_FILL = solidFill('#F2F2F2');
const INPUT_BORDER: Partial<ExcelJS.Borders> = {
  top: { style: 'thin', color: { argb: 'FFA9C79A' } },
  bottom: { style: 'thin', color: { argb: 'FFA9C79A' } },
  left: { style: 'thin', color: { argb: 'FFA9C79A' } },
  right: { style: 'thin', color: { argb: 'FFA9C79A' } },
};

export function styleInput(cell: ExcelJS.Cell): void {
  cell.fill = INPUT_FILL;
  cell.border = INPUT_BORDER;
}

export function styleLabel(cell: ExcelJS.Cell): void {
  cell.fill = LABEL_FILL;
  cell.alignment = { wrapText: true, vertical: 'top' };
}

export const REQUIRED_FONT: Partial<ExcelJS.Font> = { bold: true };
export const QUIET_FONT: Partial<ExcelJS.Font> = { italic: true, color: { argb: 'FF606060' } };
