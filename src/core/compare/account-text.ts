import { formatQuantity } from '../format/number-format.ts';
import { renderTemplate, type Params } from '../format/template.ts';
import type { AccountLine, AccountParam } from './account-line.ts';
import { ACCOUNT_TEMPLATES, type AccountKey } from './account-templates.ts';

/** A line of the account from its template; the params are kept raw. */
export function line(key: AccountKey, params: Record<string, AccountParam | AccountLine> = {}): AccountLine {
  const raw: Record<string, AccountParam> = {};
  for (const [k, v] of Object.entries(params)) raw[k] = isLine(v) ? { line: v } : v;
  return { key, code: ACCOUNT_TEMPLATES[key].code, params: raw };
}

const isLine = (v: AccountParam | AccountLine): v is AccountLine => typeof v === 'object' && 'key' in v && 'code' in v;

/** One line as text: quantities through the number formatter, nested lines written first. */
export function lineText(l: AccountLine): string {
  const params: Params = {};
  for (const [k, v] of Object.entries(l.params)) params[k] = paramText(v);
  return renderTemplate(ACCOUNT_TEMPLATES[l.key].text, params);
}

function paramText(v: AccountParam): string | number {
  if (typeof v !== 'object') return v;
  if ('line' in v) return lineText(v.line);
  return formatQuantity(v.value, v.unit);
}

/** The whole account as text, a sentence a line. */
export function accountText(lines: readonly AccountLine[]): string {
  return lines.map(lineText).join('\n');
}
