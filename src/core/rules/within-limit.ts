import type { ResolvedLimit } from '../pipeline/define-rule.ts';
import { grade } from '../pipeline/grade.ts';

/**
 * True where a value is within every level of a limit (equal is within),
 * each level times `times`: for a rule that words its fix by the verdict
 * before the context grades the finding the same way.
 */
export const withinLimit = (value: number, lim: ResolvedLimit, times = 1): boolean => grade(value, lim, lim, times).severity === 'pass';
