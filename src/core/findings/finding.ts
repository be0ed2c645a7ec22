import type { Severity } from './severity.ts';
export { SEVERITIES, severityRank, verdictOf, type Severity, type Verdict } from './severity.ts';

/** One step of a finding's working: the formula, the same with numbers put in, and what it gives. */
export interface WorkingStep {
  formula: string;
  substituted: string;
  /** What the step gives; null for a step that states an assumption or a value read. */
  result: number | null;
  unit: string;
}

/** The load combination a finding was checked in (EN 1990 names); null where no action applies. */
export type Combination = 'characteristic' | 'fundamental' | 'equilibrium' | 'accidental';

/** One result of one rule for one subject, with everything needed to audit it. */
export interface Finding {
  rule: string;
  /** Stable message code (the rule's message table). */
  code: number;
  severity: Severity;
  /** A stable id of what the finding is about: `wheel.felloe`, `crew.0`, `case.accelerating`. */
  subject: string;
  /** The same in words, for the reader: `felloe`, `driver`, `accelerating, crew aft`. */
  subject_label: string;
  /** The key of the rule's message template, and the raw numbers and words it was filled from. */
  message_key: string;
  params: Record<string, string | number>;
  /** The message as rendered from its template and params. */
  message: string;
  value: number | null;
  unit: string;
  limit: number | null;
  /** Demand over capacity (for a minimum limit, limit over value); never negative; null without a limit. */
  utilisation: number | null;
  combination: Combination | null;
  /** The load case id the finding was checked in (`static`, `braking`, `turn`, ...), or null. */
  load_case: string | null;
  fix: string;
  /** Ids of the sources in rules/sources.yaml that the limit, the data and the method rest on. */
  sources: string[];
  working: WorkingStep[];
  /** The working as text, one step a line. */
  working_text: string;
}
