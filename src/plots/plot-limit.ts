import type { Limit, RulesData } from '../data/rules-data.ts';

/** A rule's limit from the rules data, as the rule itself reads it; plots draw the same values the rules grade against. */
export function ruleLimit(data: RulesData, ruleId: string, name: string): Limit {
  const l = data.limits[ruleId]?.[name];
  if (!l) throw new Error(`rules data has no limit ${ruleId}.${name}; add it to rules/limits`);
  return l;
}
