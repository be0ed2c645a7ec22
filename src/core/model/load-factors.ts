import type { Param, RulesData } from '../data/rules-data.ts';
import { param } from '../data/param.ts';

/** A shared load-case factor from rules/parameters/load-cases.yaml. */
export function loadFactor(data: RulesData, name: 'stopping_shock_factor'): Param {
  return param(data, 'load-cases', name);
}
