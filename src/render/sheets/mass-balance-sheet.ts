import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import { numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { addCautionRow, addHeaderRow, addHeading, setColumnWidths, sumOf, wrappedHeight } from './sheet-style.ts';

// The parts table and the load-case table share the sheet's columns.
const WIDTHS = [28, 30, 13, 11, 12, 12, 13, 40, 64];
const PART_HEADER = ['Part', 'Group', 'Mass (kg)', 'x (mm)', 'y (mm)', 'z (mm)', 'Measured or computed', 'Basis'];
const CASE_HEADER = [
  'Id', 'Title', 'Crew position', 'Accel (g)', 'Pole load (N)', 'Yoke load (N)', 'Per horse (N)', 'Axle load (N)', 'Working',
];

export function addMassBalanceSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ws = wb.addWorksheet('Mass and balance');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  ws.addRow([]);
  addParts(ws, result);
  ws.addRow([]);
  addLoadCases(ws, result);
}

function addParts(ws: ExcelJS.Worksheet, result: CheckResult): void {
  addHeading(ws, 'Parts');
  addHeaderRow(ws, PART_HEADER);
  for (const p of result.mass.parts) {
    const row = ws.addRow([p.part, p.group, p.mass_kg, p.x_mm, p.y_mm, p.z_mm, p.measured ? 'measured' : 'computed', p.basis]);
    formatRow(row, ['kg', 'mm', 'mm', 'mm'], 3);
    row.getCell(8).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([{ text: p.basis, width: WIDTHS[7] }]);
  }
  const totals: [string, string, number][] = [
    ['Total, rolling assembly', 'rolling', result.mass.rolling_mass_kg],
    ['Total, yoke', 'yoke', result.mass.yoke_mass_kg],
    ['Total', '', result.mass.total_mass_kg],
  ];
  for (const [label, group, kg] of totals) {
    const row = ws.addRow([label, group, kg]);
    row.font = { bold: true };
    row.getCell(3).numFmt = numFmtForUnit('kg');
  }
}

function addLoadCases(ws: ExcelJS.Worksheet, result: CheckResult): void {
  addHeading(ws, 'Load cases');
  addHeaderRow(ws, CASE_HEADER);
  for (const c of result.balance.cases) {
    const row = ws.addRow([
      c.id, c.title, c.crew_position, c.accel_g, c.pole_load_N, c.yoke_load_N, c.per_horse_N, c.axle_load_N, c.working,
    ]);
    formatRow(row, ['g', 'N', 'N', 'N', 'N'], 4);
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
    row.getCell(9).alignment = { wrapText: true, vertical: 'top' };
    row.height = wrappedHeight([
      { text: c.title, width: WIDTHS[1] },
      { text: c.working, width: WIDTHS[8] },
    ]);
  }
}

/** Number formats for consecutive numeric cells, starting at column `first`. */
function formatRow(row: ExcelJS.Row, units: readonly string[], first: number): void {
  units.forEach((unit, i) => {
    row.getCell(first + i).numFmt = numFmtForUnit(unit);
  });
}
