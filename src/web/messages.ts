// What the page and its check worker say to each other.
import type { DecisiveInput, DecisiveSearch } from '../core/decisive/decisive-input.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import type { InputIssue } from '../core/spec/input-issue.ts';

export type ToWorker =
  | { type: 'check'; id: number; raw: unknown }
  /** The decisive inputs of this build: many re-runs, so only when asked (and in a worker of their own). */
  | { type: 'decisive'; id: number; raw: unknown }
  /** The report (HTML) or the result workbook of the last full check, to download. */
  | { type: 'file'; id: number; kind: 'report' | 'workbook' }
  /** A fill-in workbook opened on the page, read here (exceljs is large). */
  | { type: 'open-workbook'; id: number; name: string; bytes: Uint8Array };

/** What the page shows of a result (the worker keeps the whole for the downloads). */
export type ResultView = Pick<CheckResult, 'spec_name' | 'verdict' | 'provisional' | 'severity_meanings' | 'figures' | 'figures_not_applicable' | 'findings'>;

export function viewOf(r: CheckResult): ResultView {
  return { spec_name: r.spec_name, verdict: r.verdict, provisional: r.provisional, severity_meanings: r.severity_meanings, figures: r.figures, figures_not_applicable: r.figures_not_applicable, findings: r.findings };
}

export interface Picture {
  id: string;
  title: string;
  svg: string;
}

export type FromWorker =
  | { type: 'invalid'; id: number; issues: InputIssue[] }
  /** Statics first (no ride model), then the full check. `ms`: the check's own time in the worker. */
  | { type: 'result'; id: number; stage: 'statics' | 'full'; result: ResultView; ms: number }
  /** The drawings and live plots of that result, sent after it so the verdict need not wait for them. */
  | { type: 'pictures'; id: number; stage: 'statics' | 'full'; drawings: Picture[]; plots: Picture[] }
  | { type: 'decisive'; id: number; inputs: DecisiveInput[]; search: DecisiveSearch }
  | { type: 'file'; id: number; name: string; mime: string; data: string | Uint8Array }
  | { type: 'opened'; id: number; name: string; raw: unknown }
  | { type: 'not-opened'; id: number; name: string; problems: string[] }
  | { type: 'fault'; id: number; message: string };
