import type { DecisiveInput } from '../decisive/decisive-input.ts';
import type { Severity } from '../findings/severity.ts';
import type { AccountLine } from './account-line.ts';

// What `compare` gives: the builds side by side (the first is the baseline),
// the differences between them, and why their verdicts differ. Every number
// is finite or null; a figure without a value carries the reason instead.

/** One build as the comparison names it. */
export interface ComparedBuild {
  /** A, B, C ... in the order given; A is the baseline. */
  label: string;
  file: string;
  spec_name: string;
  verdict: Severity;
  /** How many findings of each severity. */
  counts: Record<Severity, number>;
}

/** One figure across the builds; differences and ratios are against the baseline (null for the baseline itself, or where either side has no value). */
export interface FigureComparison {
  name: string;
  unit: string;
  values: (number | null)[];
  /** Why a build has no value for the figure; null where it has one. */
  not_applicable: (string | null)[];
  difference: (number | null)[];
  ratio: (number | null)[];
}

/** One finding (a rule and a subject) across the builds; null where a build has no such finding. */
export interface FindingComparison {
  rule: string;
  title: string;
  subject: string;
  subject_label: string;
  severities: (Severity | null)[];
  values: (number | null)[];
  unit: string;
  messages: (string | null)[];
}

/** A value of the prepared specifications that differs: null where a build does not have it. */
export interface SpecDifference {
  /** Dotted, list indices included: `crew.0.x_mm`. */
  path: string;
  unit: string;
  values: unknown[];
}

/** One other build against the baseline: what differs in its specification and why its verdict differs. */
export interface PairAccount {
  base: string;
  other: string;
  spec_differences: SpecDifference[];
  /** The account, sentence by sentence: template codes and raw params. */
  lines: AccountLine[];
  /** The same as plain text. */
  text: string;
  /** Re-runs of the baseline made to find the account. */
  reruns: number;
}

export interface CompareResult {
  tool: { name: string; version: string };
  builds: ComparedBuild[];
  figures: FigureComparison[];
  /** Findings present in every build whose severity differs. */
  findings_differing: FindingComparison[];
  /** Findings some builds have and others do not. */
  findings_not_in_all: FindingComparison[];
  /** Each build's decisive inputs; null where the search was not run. */
  decisive_inputs: (DecisiveInput[] | null)[];
  /** The values at which the prepared specifications are not all the same. */
  spec_differences: SpecDifference[];
  accounts: PairAccount[];
  cautions: string[];
}
