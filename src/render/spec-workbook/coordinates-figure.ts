import type ExcelJS from 'exceljs';
import { addHeading, wrappedHeight } from '../sheets/sheet-style.ts';
import { COORDINATES_PNG_BASE64, COORDINATES_SIZE } from './coordinates-image.ts';

/** The axes in words, for a reader who cannot see the picture. */
export const AXES_TEXT =
  'Positions are in mm from one origin: on level ground, on the centre line, under the rear edge of the floor (the inside face of the frame\u2019s rear rail). x points forward, towards the horses; y to the chariot\u2019s left (negative to the right); z up. Heights of people are above the floor top, as their keys say.';

/** Points a pixel is on the sheet (96 px to the inch, 72 pt). */
const PT_PER_PX = 0.75;

/**
 * The coordinate diagram (docs/coordinates.svg, as its PNG) under a heading
 * and the same in words, the picture standing in one tall row of its own.
 */
export function addCoordinatesFigure(wb: ExcelJS.Workbook, ws: ExcelJS.Worksheet, widthPx: number, textWidth: number): void {
  addHeading(ws, 'Where x, y and z are measured from');
  const words = ws.addRow(['', AXES_TEXT]);
  words.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  words.height = wrappedHeight([{ text: AXES_TEXT, width: textWidth }]);
  const height = Math.round((widthPx * COORDINATES_SIZE.height) / COORDINATES_SIZE.width);
  const row = ws.addRow([]);
  row.height = height * PT_PER_PX + 6;
  const image = wb.addImage({ base64: `data:image/png;base64,${COORDINATES_PNG_BASE64}`, extension: 'png' });
  ws.addImage(image, { tl: { col: 0, row: row.number - 1 }, ext: { width: widthPx, height }, editAs: 'oneCell' });
}
