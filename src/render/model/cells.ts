import type { Severity } from '../../core/findings/finding.ts';
import type { Cell, Column, Row } from './document.ts';

// Short constructors for the tables of the report model.

export const textCell = (text: string, mark?: 'strong' | 'em'): Cell => (mark ? { kind: 'text', text, mark } : { kind: 'text', text });

export function numberCell(value: number | null, unit: string, o: { none?: string; sig?: number } = {}): Cell {
  return { kind: 'number', value, unit, ...o };
}

export const percentCell = (value: number | null): Cell => ({ kind: 'percent', value });

export const dimsCell = (values: number[], unit: string): Cell => ({ kind: 'dims', values, unit });

export const severityCell = (severity: Severity): Cell => ({ kind: 'severity', severity });

/** An empty cell. */
export const blank: Cell = { kind: 'text', text: '' };

export const left = (label: string, o: Partial<Column> = {}): Column => ({ label, align: 'left', ...o });

export const right = (label: string, o: Partial<Column> = {}): Column => ({ label, align: 'right', ...o });

export const row = (cells: Cell[], o: Omit<Row, 'cells'> = {}): Row => ({ cells, ...o });
