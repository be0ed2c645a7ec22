import { formatNumber, formatQuantity } from '../format/number-format.ts';
import type { WorkingStep } from './finding.ts';

// The steps of a finding's working, and of the models' own working: the
// formula, the same with numbers put in, and what it gives.

export function step(formula: string, substituted: string, result: number | null = null, unit = ''): WorkingStep {
  return { formula, substituted, result, unit };
}

/** A number as the working writes it: the one formatter, four significant figures. */
export function num(v: number, unit = ''): string {
  return formatNumber(v, unit, 4);
}

/** A step from a line of prose. */
export function stepOf(s: WorkingStep | string): WorkingStep {
  return typeof s === 'string' ? { formula: s, substituted: '', result: null, unit: '' } : s;
}

/** A step as one line: `formula = substituted = result unit`. */
export function stepText(s: WorkingStep): string {
  const parts = [s.formula, s.substituted].filter((p) => p !== '');
  if (s.result !== null) parts.push(formatQuantity(s.result, s.unit));
  return parts.join(' = ');
}
