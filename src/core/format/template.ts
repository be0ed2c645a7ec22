import { formatNumber, formatPercent, formatQuantity } from './number-format.ts';

// Message templates: text with {name} placeholders filled from raw params at
// render time. `{name:unit}` writes a number with that unit (`{force:N}`),
// `{name:%}` a fraction as a percentage, `{name:1}` a plain number, `{name}`
// a word or a number as it is formatted by default. A template's text holds
// no number of its own: every number comes from a param.

const PLACEHOLDER = /\{(\w+)(?::([^}]+))?\}/g;

export type Params = Record<string, string | number>;

/** The placeholders of a template, with their formats. */
export function placeholders(template: string): { name: string; format: string | undefined }[] {
  return [...template.matchAll(PLACEHOLDER)].map((m) => ({ name: m[1], format: m[2] }));
}

/** The template's own text, placeholders removed (for the no-numbers test). */
export function literalText(template: string): string {
  return template.replace(PLACEHOLDER, '');
}

function fill(v: string | number, format: string | undefined): string {
  if (typeof v === 'string') return v;
  if (format === '%') return formatPercent(v);
  if (format === undefined || format === '1') return formatNumber(v);
  return formatQuantity(v, format);
}

/** The template with every placeholder filled; a missing param is a fault in the rule, and throws. */
export function renderTemplate(template: string, params: Params): string {
  return template.replace(PLACEHOLDER, (_, name: string, format: string | undefined) => {
    if (!Object.hasOwn(params, name)) throw new Error(`message template needs the param "${name}": ${template}`);
    return fill(params[name], format);
  });
}
