import type ExcelJS from 'exceljs';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { RideSummary } from '../../core/result/ride-summary.ts';
import { cellNumber, numFmtForUnit } from '../number-format.ts';
import { headlineCaution } from '../result-cautions.ts';
import { caseHeading } from '../ride-section-md.ts';
import { addCautionRow, addHeaderRow, setColumnWidths, sumOf } from './sheet-style.ts';

const WIDTHS = [34, 18, 34, 14, 10, 60];

type Row = [item: string, quantity: string, value: number | null, unit: string, note?: string];

/** The ride model's results, case by case, and the floor damping the tuner found. */
export function addRideSheet(wb: ExcelJS.Workbook, result: CheckResult): void {
  const ride = result.ride;
  if (!ride) return;
  const ws = wb.addWorksheet('Ride');
  setColumnWidths(ws, WIDTHS);
  addCautionRow(ws, headlineCaution(result), WIDTHS.length, sumOf(WIDTHS));
  addHeaderRow(ws, ['Case', 'Item', 'Quantity', 'Value', 'Unit', 'Note']);
  for (const [item, quantity, value, unit, note] of dampingRows(ride)) addValueRow(ws, ['all cases', item, quantity, value, unit, note]);
  for (const r of ride.cases) {
    const caseName = caseHeading(r);
    const rows: Row[] = [
      ...r.crew.flatMap((c): Row[] => [
        [c.role, 'rise above standing', c.rise_mm, 'mm'],
        [c.role, 'time off the floor', c.airborne_ms, 'ms'],
        [c.role, 'floor dynamic load factor', c.floor_dlf, ''],
      ]),
      ...r.wheels.flatMap((w): Row[] => [
        [`${w.wheel} wheel`, 'time off the ground', w.airborne_ms, 'ms'],
        [`${w.wheel} wheel`, 'ground dynamic load factor', w.dlf, ''],
      ]),
      ['yoke', 'least force', r.yokeForceMin_N, 'N'],
      ['yoke', 'greatest force', r.yokeForceMax_N, 'N'],
      ['crew', 'cycles to fall below 10 %', r.decayCycles, 'cycles', r.decayCycles === null ? 'does not fall below 10 % within the run' : undefined],
      ['integration', r.method, r.steps, 'count', 'steps'],
    ];
    for (const [item, quantity, value, unit, note] of rows) addValueRow(ws, [caseName, item, quantity, value, unit, note]);
  }
}

function dampingRows(ride: RideSummary): Row[] {
  const rows: Row[] = [];
  if (ride.floor_damping_ratio_used) rows.push(['floor', 'damping ratio used', ride.floor_damping_ratio_used.value, '', ride.floor_damping_ratio_used.source]);
  rows.push([
    'floor',
    'damping ratio needed (tuner)',
    ride.floor_damping_ratio_needed,
    '',
    ride.floor_damping_ratio_needed === null
      ? 'no floor damping meets the decay rule and keeps the crew on the floor over the design bump'
      : 'the least that meets the decay rule and keeps the crew on the floor over the design bump; bisection over full runs',
  ]);
  return rows;
}

function addValueRow(ws: ExcelJS.Worksheet, cells: [string, string, string, number | null, string, string | undefined]): void {
  const [c, item, quantity, value, unit, note] = cells;
  const row = ws.addRow([c, item, quantity, cellNumber(value), unit === 'count' ? '' : unit, note ?? '']);
  row.getCell(4).numFmt = numFmtForUnit(unit);
  row.getCell(3).alignment = { wrapText: true, vertical: 'top' };
  row.getCell(6).alignment = { wrapText: true, vertical: 'top' };
}
