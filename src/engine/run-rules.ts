import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { Analysis } from './analysis.ts';
import type { Rule, RuleContext } from './rule.ts';

export function contextFor(rule: Rule, spec: CheckedSpecification, data: RulesData, analysis: Analysis): RuleContext {
  return {
    spec,
    data,
    analysis,
    limit(name) {
      const l = data.limits[rule.id]?.[name];
      if (!l) throw new Error(`rules data has no limit ${rule.id}.${name}; add it to rules/limits`);
      return l;
    },
  };
}

export function runRules(rules: readonly Rule[], spec: CheckedSpecification, data: RulesData, analysis = new Analysis(spec, data)): Finding[] {
  return rules.flatMap((rule) => rule.run(contextFor(rule, spec, data, analysis)));
}
