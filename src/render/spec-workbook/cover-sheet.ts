import type ExcelJS from 'exceljs';
import { CAUTIONS } from '../../core/cautions.ts';
import type { Section } from '../../core/spec/spec-fields.ts';
import { addCautionRow, addHeading, setColumnWidths, wrappedHeight } from '../sheets/sheet-style.ts';
import { styleInput, styleLabel } from './input-style.ts';
import { setPrint } from '../sheets/print-setup.ts';
import { addCoordinatesFigure } from './coordinates-figure.ts';
import { COVER_SHEET } from '../../core/input/workbook-layout.ts';

const WIDTHS = [24, 96];
/** The coordinate diagram's width on the sheet: across both columns, inside the printed page. */
const DIAGRAM_WIDTH_PX = 800;

const STEPS = [
  'Type only into the cream cells with a border round them. Grey cells without a border are keys, labels, units, defaults and help; they are not read, except the key column, which tells the check which value a row holds: do not edit it.',
  'Numbers are in the unit shown beside them. A value in another unit can be typed as text with its unit ("65 in", "1.65 m", "5 ft 4 in", "180 lb"); it is converted as in a YAML specification.',
  'Leave a cell empty to leave the key out: an optional key then takes the default shown in the Default column (or is computed, where it says so). Keys marked required must be filled.',
  'Species, leathers, grounds and the fixed choices (weave, joint, grade) are drop-down lists; the check refuses an id that is not in the rules data, even if typed over the list.',
  'Lists of entries (crew, lashings, loads carried, stock lumber, extra parts) are tables: one row per entry, one column per key. Empty rows are skipped. A cell holding several values (lengths_mm) takes them separated by semicolons: 2400; 3000; 3600.',
  'Keep the sheets as they are: do not rename, delete or add sheets (an extra sheet is refused, so that a renamed copy of a section cannot be silently ignored). Keep your own notes in another file.',
  'Then run: npx axletree check <this file.xlsx>. Every problem is named by its sheet and cell (Axle!C4) and its key. The result workbook opens on the verdict and ends with these sheets as read, so it can be corrected and checked again.',
];

export function addCoverSheet(wb: ExcelJS.Workbook, sections: readonly Section[]): void {
  const ws = wb.addWorksheet(COVER_SHEET);
  setColumnWidths(ws, WIDTHS);
  addHeading(ws, 'Chariot build specification: fill-in workbook', 15);
  for (const caution of CAUTIONS) addCautionRow(ws, caution, WIDTHS.length, WIDTHS[0] + WIDTHS[1]);
  ws.addRow([]);
  addHeading(ws, 'How to fill it in');
  STEPS.forEach((step, i) => {
    const row = ws.addRow([`${i + 1}.`, step]);
    row.getCell(1).alignment = { vertical: 'top', horizontal: 'right' };
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: step, width: WIDTHS[1] }]);
  });
  ws.addRow([]);
  const legend = ws.addRow(['', 'an input cell: type here']);
  styleInput(legend.getCell(1));
  const label = ws.addRow(['', 'a label, help or computed cell: not read']);
  styleLabel(label.getCell(1));
  ws.addRow([]);
  addCoordinatesFigure(wb, ws, DIAGRAM_WIDTH_PX, WIDTHS[1]);
  ws.addRow([]);
  addHeading(ws, 'Sheets');
  for (const s of sections) {
    const text = s.path.length ? `the ${s.path[0]} section${s.required ? '' : ' (optional)'}` : 'the top-level keys: version, name, moisture content';
    ws.addRow([s.sheet, text]);
  }
  setPrint(ws);
}
