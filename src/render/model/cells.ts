import type { Severity } from '../../core/findings/finding.ts';
import type { Cell, Column, Row, Run } from './document.ts';
import { plain, sourceRef } from './runs.ts';
import { runsText } from './runs-text.ts';

// Short constructors for the tables of the report model.

export const textCell = (text: string, mark?: 'strong' | 'em'): Cell => (mark ? { kind: 'text', text, mark } : { kind: 'text', text });

export function numberCell(value: number | null, unit: string, o: { none?: string; sig?: number } = {}): Cell {
  // A number a model could not reach (a ride case not run) is shown as none, never as NaN or Infinity.
  return { kind: 'number', value: value !== null && Number.isFinite(value) ? value : null, unit, ...o };
}

export const percentCell = (value: number | null): Cell => ({ kind: 'percent', value });

export const dimsCell = (values: number[], unit: string): Cell => ({ kind: 'dims', values, unit });

export const severityCell = (severity: Severity): Cell => ({ kind: 'severity', severity });

/** Text with marks or source links: the text outputs and the workbook read its plain text, HTML its runs. */
export const runsCell = (runs: Run[]): Cell => ({ kind: 'text', text: runsText(runs), runs });

/**
 * Source ids, each linked to its entry in the Sources section; shown by its
 * number there where `numbers` gives one (a dense table), else by its id.
 */
export function sourcesCell(ids: readonly string[], numbers?: ReadonlyMap<string, number>): Cell {
  const ref = (id: string) => sourceRef(id, numbers?.has(id) ? String(numbers.get(id)) : undefined);
  // By number, in the Sources section's order, so a long list reads like an index.
  const order = (id: string) => numbers?.get(id) ?? Infinity;
  const sorted = numbers ? [...ids].sort((a, b) => order(a) - order(b)) : ids;
  return runsCell(sorted.length === 0 ? [plain('none cited')] : sorted.flatMap((id, i) => (i === 0 ? [ref(id)] : [plain(numbers ? ', ' : '; '), ref(id)])));
}

/** An empty cell. */
export const blank: Cell = { kind: 'text', text: '' };

export const left = (label: string, o: Partial<Column> = {}): Column => ({ label, align: 'left', ...o });

export const right = (label: string, o: Partial<Column> = {}): Column => ({ label, align: 'right', ...o });

export const row = (cells: Cell[], o: Omit<Row, 'cells'> = {}): Row => ({ cells, ...o });
