import type { ReviewRow } from '../../core/review/review-row.ts';

// What the main thread hands a check thread for one proposal, and what it
// gets back. Plain data: it crosses between threads by structured clone.

export interface ProposalJob {
  /** As given (or as found in a folder), for the table and messages. */
  file: string;
  /** Its absolute path: the outputs must never overwrite it. */
  input: string;
  /** The proposal's folder name under the review, unique in the batch. */
  name: string;
  /** Where its outputs go: <out>/<name>. */
  dir: string;
  /** The specification as read (already found to prepare without problems). */
  raw: unknown;
}

export interface ProposalSettings {
  /** The rules data directory the main thread loaded (and found good). */
  rulesDir: string;
  /** The decisive search's work limit; null for no search. */
  workLimit: number | null;
  teach: boolean;
  pdf: boolean;
}

export interface ProposalDone {
  row: ReviewRow;
  /** Said once for the batch by the main thread (e.g. why no PDF could be printed). */
  note?: string;
}
