import type { Severity } from '../findings/severity.ts';
import type { LimitSpec, ResolvedLimit } from './define-rule.ts';

export interface Graded {
  severity: Severity;
  /** The limit the finding shows: the hard level where there is one, else the advisory level, times the capacity. */
  limit: number;
  /** Demand over capacity (for a minimum limit, limit over value); null where it has no meaning (a zero limit, a value at or below zero against a minimum). */
  utilisation: number | null;
  advisory: number | null;
  hard: number | null;
}

const beyond = (dir: 'max' | 'min', v: number, level: number) => (dir === 'max' ? v > level : v < level);

/** A value against a limit's levels (equal is within), each level times `times`. */
export function grade(value: number, lim: ResolvedLimit, spec: LimitSpec, times = 1): Graded {
  const advisory = lim.advisory === null ? null : lim.advisory * times;
  const hard = lim.hard === null ? null : lim.hard * times;
  let severity: Severity = 'pass';
  if (hard !== null && beyond(spec.direction, value, hard)) severity = spec.levels?.hard ?? 'fail';
  else if (advisory !== null && beyond(spec.direction, value, advisory)) severity = spec.levels?.advisory ?? 'warning';
  const limit = (hard ?? advisory)!;
  let utilisation: number | null = null;
  if (limit !== 0) {
    if (spec.direction === 'max') utilisation = Math.max(0, value / limit);
    else utilisation = value > 0 ? Math.max(0, limit / value) : null;
  }
  return { severity, limit, utilisation, advisory, hard };
}
