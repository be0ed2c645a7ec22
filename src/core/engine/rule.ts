import type { Limit, RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Analysis } from './analysis.ts';

export interface RuleContext {
  spec: CheckedSpecification;
  data: RulesData;
  analysis: Analysis;
  /** This rule's limit by name, from rules/limits. */
  limit(name: string): Limit;
}

/** A rule: metadata plus one function. Its id never changes once published. */
export interface Rule {
  id: string;
  title: string;
  /** What it checks, in a sentence a teacher can read out. */
  checks: string;
  /** A check can fail; a note only informs (advice), never fails. */
  kind: 'check' | 'note';
  /** The most severe finding it can give, where that is not 'fail' (a check that only warns). */
  worst?: 'warning';
  /** Names of the limits it reads from rules/limits under its id. */
  limits: readonly string[];
  run(ctx: RuleContext): Finding[];
}
