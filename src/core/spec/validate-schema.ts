import type { ErrorObject } from 'ajv/dist/2020.js';
import schema from './spec.schema.json' with { type: 'json' };
// The schema compiled to code by `npm run gen` (scripts/validator-source.ts holds ajv's options).
import { validate } from './generated/spec-validator.js';
import { unitOfKey } from '../units/units.ts';
import { issue, type InputIssue, type KeyPath } from './input-issue.ts';

export const SPEC_SCHEMA = schema;

/** Validate against the schema, filling defaults in place; every error at once. */
export function validateSchema(data: unknown): InputIssue[] {
  if (validate(data)) return [];
  return schemaIssues(validate.errors ?? [], schema);
}

type Schema = Record<string, unknown>;

/** Ajv errors as input issues, worded from the schema they were raised against. */
export function schemaIssues(errors: ErrorObject[], root: object): InputIssue[] {
  return dedupe(errors.map((e) => toIssue(e, root as Schema)));
}

function pointerToPath(pointer: string): KeyPath {
  if (pointer === '') return [];
  return pointer
    .slice(1)
    .split('/')
    .map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'))
    .map((p) => (/^\d+$/.test(p) ? Number(p) : p));
}

function show(v: unknown): string {
  return typeof v === 'string' ? `"${v}"` : JSON.stringify(v);
}

function toIssue(e: ErrorObject, root: Schema): InputIssue {
  const path = pointerToPath(e.instancePath);
  const p = e.params as Record<string, unknown>;
  const value = show(e.data);
  switch (e.keyword) {
    case 'required':
      return issue([...path, String(p.missingProperty)], 'required', { key: String(p.missingProperty) });
    case 'additionalProperties': {
      const props = Object.keys((e.parentSchema as { properties?: object }).properties ?? {});
      return issue([...path, String(p.additionalProperty)], 'unknownKey', { key: String(p.additionalProperty), allowed: props.join(', ') });
    }
    case 'type':
      return issue(path, 'wrongType', { value, allowed: describeType(String(p.type)) });
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum':
      return issue(path, 'outOfRange', { value, allowed: describeRange(withDef(schemaAt(path, root), root), unitAt(path)) });
    case 'enum':
      return issue(path, 'notInList', { value, allowed: (p.allowedValues as unknown[]).map(show).join(', ') });
    case 'const':
      return issue(path, 'notInList', { value, allowed: show(p.allowedValue) });
    case 'pattern':
      return issue(path, 'badText', { value, allowed: 'allowed: lower-case letters, digits and hyphens, starting with a letter' });
    case 'minLength':
    case 'maxLength':
      return issue(path, 'badText', { value, allowed: `allowed: text of ${describeRange({ minimum: (e.parentSchema as Record<string, number>).minLength ?? 0, maximum: (e.parentSchema as Record<string, number>).maxLength })} characters` });
    case 'minItems':
    case 'maxItems':
      // Only the bound that applies: "at most 50 entries", not "at least 0 and at most 50".
      return issue(path, 'tooMany', {
        count: Array.isArray(e.data) ? e.data.length : 0,
        allowed: `${describeRange({ minimum: (e.parentSchema as Record<string, number>).minItems, maximum: (e.parentSchema as Record<string, number>).maxItems })} entries`,
      });
    default:
      return { path, code: 1039, message: e.message ?? 'invalid value' };
  }
}

// The schema of the property at a key path (an error raised inside a shared
// definition only carries that definition, not the property's own bounds).
function schemaAt(path: KeyPath, root: Schema): Schema {
  let node: Schema = root;
  for (const key of path) {
    const next = typeof key === 'number' ? node.items : (node.properties as Record<string, unknown> | undefined)?.[key];
    if (!next) return node;
    node = next as Record<string, unknown>;
  }
  return node;
}

// A property's bounds may sit partly in a shared definition it refers to.
function withDef(s: Schema, root: Schema): Record<string, number> {
  const ref = typeof s.$ref === 'string' ? s.$ref.replace('#/$defs/', '') : undefined;
  const def = ref ? (root.$defs as Record<string, object>)[ref] : {};
  return { ...def, ...s } as Record<string, number>;
}

function describeType(t: string): string {
  return t
    .split(',')
    .map((x) => ({ number: 'a number', string: 'a string with a unit', integer: 'a whole number', object: 'a mapping of keys', array: 'a list', boolean: 'true or false' })[x] ?? x)
    .join(' or ');
}

function unitAt(path: KeyPath): string {
  const key = [...path].reverse().find((k): k is string => typeof k === 'string');
  return key ? (unitOfKey(key)?.symbol ?? '') : '';
}

function describeRange(s: Record<string, number | undefined>, unit = ''): string {
  const exclusive = s.exclusiveMinimum !== undefined && (s.minimum === undefined || s.exclusiveMinimum >= s.minimum);
  const lo = exclusive ? `more than ${s.exclusiveMinimum}` : s.minimum !== undefined ? `at least ${s.minimum}` : '';
  const hi = s.maximum !== undefined ? `at most ${s.maximum}` : '';
  const range = [lo, hi].filter(Boolean).join(' and ') || 'any number';
  return unit ? `${range} ${unit}` : range;
}

// A value failing both branches of a union type is reported once.
function dedupe(list: InputIssue[]): InputIssue[] {
  const seen = new Set<string>();
  return list.filter((i) => {
    const k = `${i.path.join('.')}|${i.message}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}
