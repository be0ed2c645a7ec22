import type { Param, RulesData } from '../data/rules-data.ts';
import type { Combination, WorkingStep } from '../findings/finding.ts';
import type { Severity } from '../findings/severity.ts';
import type { Params } from '../format/template.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { ModelId, ModelValues } from './model-values.ts';

/** How a limit is compared: a value must stay at or below (`max`) or at or above (`min`) it. */
export interface LimitSpec {
  direction: 'max' | 'min';
  unit: string;
  /** The severity beyond each level; defaults: advisory gives warning, hard gives fail. */
  levels?: { advisory?: Severity; hard?: Severity };
}

/** A message template with its stable code; `{name:unit}` placeholders are filled from raw params. */
export interface MessageSpec {
  code: number;
  text: string;
}

/** A limit as the rule reads it: the levels' values from the data, with their sources. */
export interface ResolvedLimit {
  name: string;
  unit: string;
  direction: 'max' | 'min';
  advisory: number | null;
  hard: number | null;
  sources: string[];
}

/** What a rule reports; the context fills in the rest (rule, code, severity, utilisation, sources). */
export interface Report<L extends string, M extends string> {
  /** A stable id of what is checked: `wheel.felloe`, `crew.0`, `case.accelerating`. */
  subject: string;
  /** The same in words for the reader. */
  label: string;
  /** The message key, or one key per severity where the wording follows the verdict. */
  message: M | { readonly [S in Severity]?: M };
  params?: Params;
  value?: number | null;
  unit?: string;
  /**
   * The limit the value is compared with: the severity follows from its
   * direction and levels, each level times `times` where the limit is a
   * fraction of a computed capacity (a design strength, a threshold).
   */
  against?: { limit: L; times?: number };
  /** The severity, only where nothing is compared (a note, a check that could not be done). */
  severity?: Severity;
  fix: string;
  /** Sources of the data and methods the value rests on, besides the limit's and the rule's own. */
  sources?: readonly string[];
  working: readonly (WorkingStep | string)[];
  load_case?: string | null;
  combination?: Combination | null;
}

export interface RuleContext<N extends ModelId, L extends string, P extends string, M extends string> {
  spec: CheckedSpecification;
  data: RulesData;
  /** The models the rule names in `needs`, each computed on first read. */
  models: { readonly [K in N]: ModelValues[K] };
  /** One of the rule's own parameters (rules/limits, under the rule's id). */
  param(name: P): Param;
  /** One of the rule's limits, resolved from the data. */
  limit(name: L): ResolvedLimit;
  report(r: Report<L, M>): void;
}

export interface RuleSpec<N extends ModelId, L extends string, P extends string, M extends string> {
  /** `family.name`; never reused or renamed once published. */
  id: string;
  title: string;
  /** What it checks, in a sentence a teacher can read out. */
  checks: string;
  /** A check can fail; a note only informs (severity info) and never counts toward the verdict. */
  kind: 'check' | 'note';
  /** The most severe finding a check can give, where that is not fail. */
  worst?: 'advice' | 'warning';
  /**
   * True for a check of the model's own arithmetic (a solver's convergence), not of the build: its utilisation is
   * no margin of the build's, so it is never among the findings whose decisive inputs are searched.
   */
  ofTheModel?: true;
  /** The sources of the rule's method (a section of the design basis, a standard). */
  method: readonly string[];
  needs: readonly N[];
  limits: { readonly [K in L]: LimitSpec };
  params: readonly P[];
  messages: { readonly [K in M]: MessageSpec };
  run(ctx: RuleContext<N, L, P, M>): void;
}

/** A rule with its types erased, as the registry and the pipeline hold it. */
export interface Rule {
  id: string;
  title: string;
  checks: string;
  kind: 'check' | 'note';
  worst?: 'advice' | 'warning';
  ofTheModel?: true;
  method: readonly string[];
  needs: readonly ModelId[];
  limits: Readonly<Record<string, LimitSpec>>;
  params: readonly string[];
  messages: Readonly<Record<string, MessageSpec>>;
  run(ctx: RuleContext<ModelId, string, string, string>): void;
}

/** A rule: metadata plus one function, typed by the models, limits, parameters and messages it names. */
export function defineRule<N extends ModelId, L extends string = never, P extends string = never, M extends string = string>(spec: RuleSpec<N, L, P, M>): Rule {
  return spec;
}
