import { isLimitData, type RulesData } from '../data/rules-data.ts';
import type { ModelDef } from './define-model.ts';
import type { Rule } from './define-rule.ts';

/** Something a model or rule declares that the data does not hold: where it belongs, and what is wrong. */
export interface DeclaredDataProblem {
  /** `params` (rules/parameters) or `limits` (rules/limits). */
  table: 'params' | 'limits';
  /** The parameter group or the rule id. */
  group: string;
  name: string;
  message: string;
}

const has = <T>(table: Record<string, Record<string, T>>, group: string, name: string): T | undefined =>
  Object.hasOwn(table, group) && Object.hasOwn(table[group], name) ? table[group][name] : undefined;

/**
 * Every parameter the models declare and every limit and parameter the rules
 * declare must be in the data, in the right shape; checked when the data is
 * loaded, so a missing number is a load error naming its file and key, never
 * a default at run time.
 */
export function declaredDataProblems(data: RulesData, models: readonly ModelDef[], rules: readonly Rule[]): DeclaredDataProblem[] {
  const out: DeclaredDataProblem[] = [];
  for (const m of models) {
    for (const key of m.params) {
      // Groups may hold dots (`floor.solver`); declared names do not.
      const dot = key.lastIndexOf('.');
      const group = key.slice(0, dot);
      const name = key.slice(dot + 1);
      if (!has(data.params, group, name)) out.push({ table: 'params', group, name, message: `the model "${m.id}" reads the parameter ${group}.${name}, which the data does not hold: add it to rules/parameters` });
    }
  }
  for (const r of rules) {
    for (const [name, spec] of Object.entries(r.limits)) {
      const d = has(data.limits, r.id, name);
      if (!d) out.push({ table: 'limits', group: r.id, name, message: `the rule ${r.id} compares with the limit ${name}, which the data does not hold: add it to rules/limits with an advisory or hard level` });
      else if (!isLimitData(d)) out.push({ table: 'limits', group: r.id, name, message: `the rule ${r.id} needs ${name} as a limit with levels (advisory, hard), not a single value` });
      else if (d.advisory && d.hard && (spec.direction === 'max' ? d.advisory.value > d.hard.value : d.advisory.value < d.hard.value)) {
        out.push({ table: 'limits', group: r.id, name, message: `the advisory level ${d.advisory.value} lies beyond the hard level ${d.hard.value} for a ${spec.direction === 'max' ? 'maximum' : 'minimum'}` });
      }
    }
    for (const name of r.params) {
      const d = has(data.limits, r.id, name);
      if (!d || isLimitData(d)) out.push({ table: 'limits', group: r.id, name, message: `the rule ${r.id} reads the parameter ${name}, which the data does not hold as a value: add { value, unit, source } under ${r.id} in rules/limits` });
    }
  }
  return out;
}
