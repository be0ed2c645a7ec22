import { gradeUpper } from '../../engine/make-finding.ts';
import type { RuleContext } from '../../engine/rule.ts';
import type { Limit } from '../../data/rules-data.ts';
import type { Severity } from '../../findings/finding.ts';

export interface FractionGrade {
  adv: Limit;
  hard: Limit;
  advA: number;
  hardA: number;
  severity: Severity;
  /** The limit the finding reports: the hard one once it is passed, else the advisory one. */
  lim: { l: Limit; a: number; level: 'hard' | 'advisory' };
}

/** Grade a value against the rule's advisory and hard fractions of a threshold. */
export function gradeFractions(ctx: RuleContext, value: number, threshold: number): FractionGrade {
  const adv = ctx.limit('advisory_fraction');
  const hard = ctx.limit('hard_fraction');
  const advA = adv.value * threshold;
  const hardA = hard.value * threshold;
  const severity = gradeUpper(value, advA, hardA);
  const lim = severity === 'fail' ? { l: hard, a: hardA, level: 'hard' as const } : { l: adv, a: advA, level: 'advisory' as const };
  return { adv, hard, advA, hardA, severity, lim };
}
