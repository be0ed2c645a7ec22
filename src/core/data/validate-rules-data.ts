// Checks assembled rules data against the JSON Schema and turns each schema
// error into plain words: the key path and what is allowed there.
import type { ErrorObject } from 'ajv/dist/2020.js';
// The schema compiled to code by `npm run gen` (scripts/validator-source.ts holds ajv's options).
import { validate } from './generated/rules-data-validator.js';

export interface SchemaProblem {
  /** Key path from the root of the assembled data. */
  path: string[];
  message: string;
}

/** Every problem in the data; an empty list when it matches the schema. */
export function schemaProblems(data: unknown): SchemaProblem[] {
  if (validate(data)) return [];
  const seen = new Set<string>();
  const out: SchemaProblem[] = [];
  for (const e of validate.errors ?? []) {
    const p = toProblem(e);
    if (p === null) continue;
    const key = p.path.join('\u0000') + '\u0001' + p.message;
    if (seen.has(key)) continue; // a $ref and its override can both report one fault
    seen.add(key);
    out.push(p);
  }
  return out;
}

function pointerToPath(pointer: string): string[] {
  if (pointer === '') return [];
  return pointer
    .split('/')
    .slice(1)
    .map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}

function shown(data: unknown): string {
  if (data === undefined) return 'nothing';
  const text = JSON.stringify(data) ?? typeof data;
  return text.length > 60 ? text.slice(0, 57) + '...' : text;
}

interface SchemaNode {
  description?: string;
  properties?: Record<string, unknown>;
}

function allowed(e: ErrorObject): string {
  const parent = e.parentSchema as SchemaNode | undefined;
  return parent?.description ?? e.message ?? 'a valid value';
}

function toProblem(e: ErrorObject): SchemaProblem | null {
  const path = pointerToPath(e.instancePath);
  const parent = e.parentSchema as SchemaNode | undefined;
  switch (e.keyword) {
    case 'if':
    case 'propertyNames':
      return null; // the nested error says more
    case 'required': {
      const missing = String((e.params as { missingProperty: string }).missingProperty);
      return { path, message: `missing key "${missing}": must be ${allowed(e)}` };
    }
    case 'additionalProperties': {
      const extra = String((e.params as { additionalProperty: string }).additionalProperty);
      const keys = Object.keys(parent?.properties ?? {}).join(', ');
      return { path: [...path, extra], message: `unknown key "${extra}": allowed keys are ${keys}` };
    }
    case 'minProperties':
      return { path, message: `must hold at least one entry (${allowed(e)})` };
    default:
      if (e.propertyName !== undefined) {
        return {
          path: [...path, e.propertyName],
          message: `key "${e.propertyName}" is not allowed: a key must be ${allowed(e)}`,
        };
      }
      return { path, message: `must be ${allowed(e)}, found ${shown(e.data)}` };
  }
}
