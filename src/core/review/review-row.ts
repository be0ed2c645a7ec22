import type { DecisiveInput } from '../decisive/decisive-input.ts';
import type { Severity } from '../findings/severity.ts';
import type { CheckResult } from '../result/check-result.ts';
import { worstFindings } from './worst-findings.ts';

// One proposal of a batch review as its row of the review table: what a
// reviewer reads first (the verdict, the worst findings, what the verdict
// hangs on, cost and mass) and where the full report is. A file that could
// not be checked is a row too, with its error.

/** The decisive inputs a row shows (the first few, in the check's order). */
export const DECISIVE_SHOWN = 3;

export interface ReviewFinding {
  rule: string;
  severity: Severity;
  subject: string;
  /** Short: what it is about, and how much of its limit it uses where it has one. */
  subject_label: string;
  utilisation: number | null;
}

export type ReviewDecisive = Pick<DecisiveInput, 'rule' | 'input' | 'value' | 'unit' | 'break_even' | 'to_severity' | 'reason'>;

/** checked: the proposal's outputs were written; refused: its file (or its output place) was refused; fault: the tool failed on it. */
export type ReviewStatus = 'checked' | 'refused' | 'fault';

export interface ReviewRow {
  /** The file as given (or as found in a folder). */
  file: string;
  /** Its folder under the review's output folder, unique in the batch. */
  name: string;
  status: ReviewStatus;
  /** The build's own name (spec.name); null where it was not read. */
  build: string | null;
  verdict: Severity | null;
  /** Why it was not checked: the first problem, where it is found; null for a checked proposal. */
  error: string | null;
  worst: ReviewFinding[];
  /** Null where the search was not run (--no-decisive, or not checked). */
  decisive: ReviewDecisive[] | null;
  /** The stock plan's cost where every stock length is priced; else null. */
  cost: number | null;
  total_mass_kg: number | null;
  /** The static pole load on each horse at the yoke, and the axle's load, as the check's figures state them. */
  load_per_horse_n: number | null;
  axle_load_n: number | null;
  /** The full report, relative to the review table; null where none was written. */
  report: string | null;
}

/** The name of the full report inside a proposal's folder. */
export const REPORT_FILE = 'report.html';

const figure = (r: CheckResult, id: string): number | null => r.figures[id]?.value ?? null;

export function checkedRow(file: string, name: string, r: CheckResult): ReviewRow {
  return {
    file,
    name,
    status: 'checked',
    build: r.spec_name,
    verdict: r.verdict,
    error: null,
    worst: worstFindings(r.findings).map((f) => ({ rule: f.rule, severity: f.severity, subject: f.subject, subject_label: f.subject_label, utilisation: f.utilisation })),
    decisive: r.decisive_inputs ? r.decisive_inputs.slice(0, DECISIVE_SHOWN).map((d) => ({ rule: d.rule, input: d.input, value: d.value, unit: d.unit, break_even: d.break_even, to_severity: d.to_severity, ...(d.reason ? { reason: d.reason } : {}) })) : null,
    cost: r.cutting.stock_plan.cost,
    total_mass_kg: r.mass.total_mass_kg,
    load_per_horse_n: figure(r, 'yoke_load_per_horse'),
    axle_load_n: figure(r, 'axle_load'),
    report: `${name}/${REPORT_FILE}`,
  };
}

/** A proposal that was not checked: its file refused, or the tool failed on it. */
export function uncheckedRow(file: string, name: string, status: Exclude<ReviewStatus, 'checked'>, error: string): ReviewRow {
  return { file, name, status, build: null, verdict: null, error, worst: [], decisive: null, cost: null, total_mass_kg: null, load_per_horse_n: null, axle_load_n: null, report: null };
}
