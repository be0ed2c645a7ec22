// Refusals of inputs too large for the tool to work through in its time and
// memory (not wrong, only more than a chariot or a workshop needs), with stable
// codes beside the main table's.
import type { InputIssue, KeyPath } from '../spec/input-issue.ts';

export const LIMIT_MESSAGES = {
  stockTooManyPieces: { code: 1240, text: 'the pieces to cut total {count}; allowed: at most {max} in one plan (plan the job in parts).' },
  strapPitchWide: { code: 1241, text: 'the strap pitch {value} mm leaves no strap across the floor ({span} mm {across}); allowed: less than {max} mm.' },
} as const;

export type LimitMessageKey = keyof typeof LIMIT_MESSAGES;

/** An input issue from this table; every placeholder must be given. */
export function limitIssue(path: KeyPath, key: LimitMessageKey, params: Record<string, string | number>): InputIssue {
  const m = LIMIT_MESSAGES[key];
  const message = m.text.replace(/\{(\w+)\}/g, (_, name: string) => {
    if (!Object.hasOwn(params, name)) throw new Error(`message ${key} needs the param "${name}"`);
    return String(params[name]);
  });
  return { path, code: m.code, message };
}
