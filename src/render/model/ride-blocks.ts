// The ride model's results in the report model, shared by the check report's
// ride section and the ride command's report: the floor damping, then per
// case the crew, the wheels, the yoke and the decay, and the case's plots.

import type { RideResult } from '../../core/ride/ride-types.ts';
import { ridePlotFile, ridePlotText, type RidePlotKind } from '../ride-plots.ts';
import type { Block, Row, TableBlock } from './document.ts';
import { left, numberCell, right, row, textCell } from './cells.ts';
import { plotFigure } from './figure-blocks.ts';
import { workingLines } from './runs.ts';

export type RideCaseResult = Omit<RideResult, 'series'>;

export interface RideDamping {
  /** The least damping that works; null where none does; absent where the tuner did not run. */
  needed?: number | null;
  used?: { value: number; source: string };
  working?: string;
}

const QUANTITY_COLUMNS = [left('Quantity'), right('Value'), left('Unit', { only: 'sheet' }), left('Note')];

/** One quantity with its unit (named beside the number in text, in a column of its own in the workbook) and a note. */
function quantityRow(label: string, value: number | null, unit: string, note: string, none?: string): Row {
  return row([textCell(label), numberCell(value, unit, none === undefined ? {} : { none }), textCell(unit === 'count' ? '' : unit), textCell(note)]);
}

/** The floor damping ratio used and the least the tuner found, with its working. */
export function rideDampingBlocks(d: RideDamping): Block[] {
  const rows: Row[] = [];
  if (d.used) rows.push(quantityRow('Floor damping ratio used', d.used.value, '', d.used.source));
  if (d.needed !== undefined) {
    const note = d.needed === null
      ? 'no floor damping ratio meets the decay rule and keeps the crew on the floor over rough ground'
      : 'the least that meets the decay rule and keeps the crew on the floor over rough ground; found by bisection over full runs';
    rows.push(quantityRow('Floor damping ratio needed (tuner)', d.needed, '', note, 'none'));
  }
  if (rows.length === 0) return [];
  const table: TableBlock = { kind: 'table', id: 'ride-damping', columns: QUANTITY_COLUMNS, rows, empty: '' };
  return [table, ...(d.working ? [workingLines(d.working.split('\n'))] : [])];
}

/** "Rough-ground ridge across both tracks (rough-ridge)": the model's title, then the case's id as the command line names it. */
export function caseHeading(r: Pick<RideCaseResult, 'title' | 'case'>): string {
  return `${r.title.charAt(0).toUpperCase()}${r.title.slice(1)} (${r.case})`;
}

function crewTable(r: RideCaseResult): TableBlock {
  const rows = r.crew.map((c) => row([textCell(c.role), numberCell(c.rise_mm, 'mm'), numberCell(c.airborne_ms, 'ms'), numberCell(c.floor_dlf, '')]));
  const columns = [left('Crew'), right('Rise above standing', { unit: 'mm' }), right('Time off the floor', { unit: 'ms' }), right('Floor dynamic load factor', { unit: '' })];
  return { kind: 'table', id: `ride-${r.case}-crew`, columns, rows, empty: 'No crew.' };
}

function wheelsTable(r: RideCaseResult): TableBlock {
  const rows = r.wheels.map((w) => row([textCell(w.wheel), numberCell(w.airborne_ms, 'ms'), numberCell(w.dlf, '')]));
  const columns = [left('Wheel'), right('Time off the ground', { unit: 'ms' }), right('Ground dynamic load factor', { unit: '' })];
  return { kind: 'table', id: `ride-${r.case}-wheels`, columns, rows, empty: 'No wheels.' };
}

function caseTable(r: RideCaseResult): TableBlock {
  const decay = r.decayCycles === null ? 'the motion does not fall that far within the run' : '';
  const rows = [
    quantityRow('Yoke force, least', r.yokeForceMin_N, 'N', ''),
    quantityRow('Yoke force, greatest', r.yokeForceMax_N, 'N', ''),
    quantityRow("Cycles until the crew's motion falls below 10 % of its first amplitude", r.decayCycles, 'cycles', decay, 'not within the run'),
    quantityRow('Integration steps', r.steps, 'count', r.method),
  ];
  return { kind: 'table', id: `ride-${r.case}-case`, columns: QUANTITY_COLUMNS, rows, empty: '' };
}

/** A case's plots, as the files written beside the report. */
export function ridePlotFigures(r: Pick<RideCaseResult, 'case' | 'title'>, plots: readonly RidePlotKind[]): Block[] {
  return plots.map((kind) => plotFigure({ id: `ride-${r.case}-${kind}`, ...ridePlotText(r.title, kind) }, ridePlotFile(r.case, kind)));
}

/** One case's tables, then its plots (files written beside the report). */
export function rideCaseBlocks(r: RideCaseResult, plots: readonly RidePlotKind[]): Block[] {
  return [crewTable(r), wheelsTable(r), caseTable(r), ...ridePlotFigures(r, plots)];
}
