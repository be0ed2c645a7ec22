import type { WorkingStep } from '../findings/finding.ts';
import { formatNumber } from '../format/number-format.ts';

/** A step of a finding's working: the formula, the same with numbers put in, and what it gives. */
export function step(formula: string, substituted: string, result: number | null = null, unit = ''): WorkingStep {
  return { formula, substituted, result, unit };
}

/** A number as the working writes it: the one formatter, four significant figures. */
export function num(v: number, unit = ''): string {
  return formatNumber(v, unit, 4);
}
