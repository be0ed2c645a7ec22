import type { Limit, RulesData } from '../data/rules-data.ts';

/** A shared load-case factor from rules/limits/load-cases.yaml. */
export function loadFactor(data: RulesData, name: 'bump_dynamic_factor' | 'braking_strut_factor' | 'stopping_shock_factor'): Limit {
  const f = data.limits['load-cases']?.[name];
  if (!f) throw new Error(`rules data has no load-cases.${name}; add it to rules/limits/load-cases.yaml`);
  return f;
}
