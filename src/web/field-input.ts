import type { Field } from '../core/spec/spec-fields.ts';

// What a typed text means for a field: nothing (the key is left out, so its
// default holds), a number, a string with a unit where the spec converts it
// ("2 ft 6 in"), or the text as typed, for the schema to refuse at the field.

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

export function valueOfText(text: string, field: Field): unknown {
  const t = text.trim();
  if (t === '') return undefined;
  if (field.type === 'boolean') return t === 'true';
  if (field.type === 'list') return t.split(',').map((x) => x.trim()).filter((x) => x !== '').map((x) => (NUMBER.test(x) ? Number(x) : x));
  if (field.enum) {
    const hit = field.enum.find((e) => String(e) === t);
    return hit ?? t;
  }
  if (field.type === 'number' || field.type === 'integer') return NUMBER.test(t) ? Number(t) : t;
  return t;
}

/** A value of the spec as the field shows it. */
export function textOfValue(v: unknown): string {
  if (v === undefined || v === null) return '';
  if (Array.isArray(v)) return v.join(', ');
  if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') return String(v);
  return JSON.stringify(v);
}
