import type { Limit, RulesData } from './rules-data.ts';

/** A rule's limit from the rules data: what a rule reads through ctx.limit, and the plots draw. */
export function ruleLimit(data: RulesData, ruleId: string, name: string): Limit {
  const l = data.limits[ruleId]?.[name];
  if (!l) throw new Error(`rules data has no limit ${ruleId}.${name}; add it to rules/limits`);
  return l;
}
