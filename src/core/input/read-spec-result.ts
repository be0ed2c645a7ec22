import type { InputIssue, KeyPath } from '../spec/input-issue.ts';

export interface Located {
  line: number;
  column: number;
  /** In a workbook: the sheet and cell, `Axle!C4` (line and column are then its row and column). */
  cell?: string;
}

/** Where a key path sits; `key` asks for the key itself rather than its value. */
export type Locator = (path: KeyPath, key?: boolean) => Located | undefined;

/** A specification as read from its text or bytes: the raw value and where each key sits, or what is wrong. */
export type ReadSpec =
  | { ok: true; raw: unknown; locate: Locator }
  | { ok: false; issues: (InputIssue & { at?: Located })[] };
