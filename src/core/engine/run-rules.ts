import type { RulesData } from '../data/rules-data.ts';
import { ruleLimit } from '../data/rule-limit.ts';
import type { Finding } from '../findings/finding.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { Analysis } from './analysis.ts';
import type { Rule, RuleContext } from './rule.ts';

export function contextFor(rule: Rule, spec: CheckedSpecification, data: RulesData, analysis: Analysis): RuleContext {
  return {
    spec,
    data,
    analysis,
    limit: (name) => ruleLimit(data, rule.id, name),
  };
}

export function runRules(rules: readonly Rule[], spec: CheckedSpecification, data: RulesData, analysis = new Analysis(spec, data)): Finding[] {
  return rules.flatMap((rule) => rule.run(contextFor(rule, spec, data, analysis)));
}
