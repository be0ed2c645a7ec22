import type { AccountKey } from './account-templates.ts';

/** A number with its unit, formatted only when the line is written out. */
export interface Quantity {
  value: number;
  unit: string;
}

/** A param of a line: a word, a plain number, a quantity, or a phrase that is a line of its own. */
export type AccountParam = string | number | Quantity | { line: AccountLine };

/** One sentence (or phrase) of the account: a template by its key and code, and the raw params it is filled from. */
export interface AccountLine {
  key: AccountKey;
  code: number;
  params: Record<string, AccountParam>;
}
