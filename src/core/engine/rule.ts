import type { Limit, RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Analysis } from './analysis.ts';

// The older shape of a rule, kept while rules move to defineRule
// (src/core/pipeline/define-rule.ts); the registry adapts each.

export interface LegacyRuleContext {
  spec: CheckedSpecification;
  data: RulesData;
  analysis: Analysis;
  /** This rule's limit by name, from rules/limits. */
  limit(name: string): Limit;
}

export interface LegacyRule {
  id: string;
  title: string;
  checks: string;
  kind: 'check' | 'note';
  worst?: 'warning';
  limits: readonly string[];
  run(ctx: LegacyRuleContext): Finding[];
}

/** @deprecated the older name */
export type Rule = LegacyRule;
export type RuleContext = LegacyRuleContext;
