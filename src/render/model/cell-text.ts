// How the text outputs (Markdown and HTML) write a cell, a column header and
// a working step: every number through the one formatter. The workbook keeps
// the raw numbers instead (src/render/sheets/sheet-table.ts).

import type { WorkingStep } from '../../core/findings/finding.ts';
import { formatNumber, formatPercent, formatQuantity, NO_VALUE } from '../../core/format/number-format.ts';
import type { Cell, Column } from './document.ts';

/** Units a reader does not need named beside a number: plain ratios, counts, and money (whatever currency the prices are in). */
const UNNAMED = new Set(['', '1', 'count', 'currency']);

/** The unit as a reader sees it beside a number, or '' where none is named. */
export function shownUnit(unit: string): string {
  return UNNAMED.has(unit) ? '' : unit;
}

function quantity(value: number, unit: string, sig: number | undefined, bare: boolean): string {
  return bare || shownUnit(unit) === '' ? formatNumber(value, unit, sig) : formatQuantity(value, unit, sig);
}

/** A column's heading: its label, and the unit its numbers are in. */
export function headerText(c: Column): string {
  const unit = c.unit === undefined ? '' : shownUnit(c.unit);
  const label = c.parts ? `${c.label} ${c.parts.join(' x ')}` : c.label;
  return unit ? `${label} (${unit})` : label;
}

/** A cell as plain text; the number's unit is left out where the header or a column of its own names it. */
export function cellText(cell: Cell, column: Column): string {
  const bare = column.bare === true || column.unit !== undefined;
  switch (cell.kind) {
    case 'text':
      return cell.text;
    case 'number':
      return cell.value === null ? (cell.none ?? NO_VALUE) : quantity(cell.value, cell.unit, cell.sig, bare);
    case 'percent':
      return formatPercent(cell.value);
    case 'dims': {
      const text = cell.values.map((v) => formatNumber(v, cell.unit)).join(' x ');
      return bare || shownUnit(cell.unit) === '' ? text : `${text} ${shownUnit(cell.unit)}`;
    }
    case 'severity':
      return cell.severity.toUpperCase();
  }
}

/** The parts of a working step as written: the formula, the same with numbers, and what it gives. */
export function stepParts(s: WorkingStep): string[] {
  const parts = [s.formula, s.substituted].filter((p) => p !== '');
  if (s.result !== null) parts.push(formatQuantity(s.result, s.unit));
  return parts;
}

/** A working step on one line: `formula = substituted = result`. */
export function stepLine(s: WorkingStep): string {
  return stepParts(s).join(' = ');
}
