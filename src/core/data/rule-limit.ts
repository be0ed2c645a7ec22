import type { Param, RulesData } from './rules-data.ts';
import { ruleParam } from './param.ts';

/** A rule's own parameter from the rules data (older rules read their limits this way). */
export function ruleLimit(data: RulesData, ruleId: string, name: string): Param {
  return ruleParam(data, ruleId, name);
}
