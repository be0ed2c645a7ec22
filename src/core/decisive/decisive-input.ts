import type { Severity } from '../findings/finding.ts';
import type { InputStatus } from './input-path.ts';

/** One input a finding's severity hangs on, and the value at which the severity would change. */
export interface DecisiveInput {
  rule: string;
  subject: string;
  /** The finding's severity as checked. */
  severity: Severity;
  input: string;
  origin: 'spec' | 'data';
  value: number;
  unit: string;
  status: InputStatus;
  /** The nearest value (to half a percent) at which the severity changes; null with a reason where none in range does. */
  break_even: number | null;
  to_severity: Severity | null;
  /** break_even over value, less one: how far the input may move before the answer changes. */
  change: number | null;
  reason?: string;
}

/** What the search did, so a reader can judge how complete it is. */
export interface DecisiveSearch {
  findings: number;
  candidates: number;
  reruns: number;
  /** The work done, in re-runs that do not reach the ride model (one that does counts ten). */
  work: number;
  work_limit: number;
  /** Pairs of finding and input left unsearched when the work limit was reached. */
  unsearched: number;
}
