// Mutations of valid specifications for the property tests and `npm run fuzz`:
// a key removed, a list entry duplicated, a value made extreme, of the wrong
// type or unit, or huge. Built on fast-check so a failure shrinks to a small case.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { parse } from 'yaml';
import { REPO } from './run-cli.ts';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = (string | number)[];

/** The demos and the validation specs, parsed. */
export const SPECS: Record<string, Json> = Object.fromEntries(
  [
    ...readdirSync(join(REPO, 'specs')).filter((f) => f.endsWith('.yaml')).map((f) => join('specs', f)),
    ...readdirSync(join(REPO, 'specs', 'validation')).filter((f) => f.endsWith('.yaml')).map((f) => join('specs', 'validation', f)),
  ].map((f) => [f, parse(readFileSync(join(REPO, f), 'utf8')) as Json]),
);

/** Every path in a spec: leaves and the objects and lists above them. */
export function pathsOf(node: Json, at: Path = []): Path[] {
  if (node === null || typeof node !== 'object') return [at];
  const inner = Array.isArray(node) ? node.flatMap((v, i) => pathsOf(v, [...at, i])) : Object.entries(node).flatMap(([k, v]) => pathsOf(v, [...at, k]));
  return at.length ? [at, ...inner] : inner;
}

export type Mutation =
  | { kind: 'remove' }
  | { kind: 'duplicate' }
  | { kind: 'set'; value: Json }
  | { kind: 'scale'; factor: number };

/** Values a careless or hostile input may hold where a number, a name or a list belongs. */
const odd: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(0, -1, 1e-12, 1e-4, 1e12, 1e308, -1e308, 'NaN', 'Infinity', '', ' ', 'constructor', '__proto__', 'toString', null, true, [], {}, '20 kg', '3 ft', '1e999 mm', '-0'),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.string({ maxLength: 40 }),
  fc.string({ minLength: 2000, maxLength: 5000 }),
);

export const mutationArb: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 1, arbitrary: fc.constant<Mutation>({ kind: 'remove' }) },
  { weight: 1, arbitrary: fc.constant<Mutation>({ kind: 'duplicate' }) },
  { weight: 3, arbitrary: odd.map((value): Mutation => ({ kind: 'set', value })) },
  // Plausible but unusual builds: a number scaled, which the schema often still accepts.
  { weight: 5, arbitrary: fc.constantFrom(0.01, 0.1, 0.5, 0.8, 1.25, 2, 10, 100).map((factor): Mutation => ({ kind: 'scale', factor })) },
);

/** A spec name, a path in it and a mutation (one to three of them). */
export const caseArb = fc.constantFrom(...Object.keys(SPECS)).chain((name) => {
  const paths = pathsOf(SPECS[name]);
  return fc.record({
    name: fc.constant(name),
    changes: fc.array(fc.record({ path: fc.constantFrom(...paths), mutation: mutationArb }), { minLength: 1, maxLength: 3 }),
  });
});

export type MutationCase = { name: string; changes: { path: Path; mutation: Mutation }[] };

/** The spec with the case's changes applied (the original is not touched). */
export function mutated(c: MutationCase): Json {
  const spec = structuredClone(SPECS[c.name]);
  for (const { path, mutation } of c.changes) {
    const parent = path.slice(0, -1).reduce<Json | undefined>((n, k) => (n !== null && typeof n === 'object' ? (n as Record<string | number, Json>)[k] : undefined), spec);
    if (parent === null || parent === undefined || typeof parent !== 'object') continue;
    const key = path[path.length - 1];
    const holder = parent as Record<string | number, Json>;
    if (!Object.hasOwn(holder, key)) continue;
    if (mutation.kind === 'remove') {
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete holder[key];
    } else if (mutation.kind === 'duplicate') {
      if (Array.isArray(parent)) parent.splice(Number(key), 0, structuredClone(parent[Number(key)]));
      else holder[key] = [structuredClone(holder[key])];
    } else if (mutation.kind === 'scale') {
      if (typeof holder[key] === 'number') holder[key] = (holder[key]) * mutation.factor;
    } else holder[key] = mutation.value;
  }
  return spec;
}

/** Every number in a value that is not finite, by path: none may reach an output. */
export function nonFinite(value: unknown, at = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [at];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${at}.${k}`));
}
