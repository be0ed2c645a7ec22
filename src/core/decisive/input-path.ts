import type { RulesData } from '../data/rules-data.ts';
import type { InputKey } from '../pipeline/read-tracer.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import { pathText } from '../spec/input-issue.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { builderEstimate } from './builder-estimates.ts';

// An input a finding read, as a reader names it and as the search changes it.

export type InputStatus = 'given' | 'defaulted' | 'from-memory';

export interface InputInfo {
  key: InputKey;
  /** A spec path with list indices (`crew.0.x_mm`), or a data file and path (`rules/limits/floor.yaml#floor.sag.sag.advisory`). */
  input: string;
  origin: 'spec' | 'data';
  value: number;
  unit: string;
  status: InputStatus;
}

type Path = (string | number)[];

const steps = (key: InputKey): Path =>
  key.startsWith('spec:') ? key.slice(5).split('.').map((s) => (/^\d+$/.test(s) ? Number(s) : s)) : key.slice(5).split('/').map((s) => (/^\d+$/.test(s) ? Number(s) : s));

function at(root: unknown, path: Path): unknown {
  let node = root;
  for (const s of path) node = typeof node === 'object' && node !== null ? (node as Record<string | number, unknown>)[s] : undefined;
  return node;
}

/** A copy of root with the value at path replaced; only the objects on the path are copied. */
function setIn<T>(root: T, path: Path, value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path;
  const node = root as Record<string | number, unknown>;
  const copy = (Array.isArray(node) ? [...node] : { ...node }) as Record<string | number, unknown>;
  copy[head] = setIn(node[head], rest, value);
  return copy as T;
}

/** The nearest unit stated on the path to a data value (a parameter's or a limit's), else a key's unit suffix. */
function dataUnit(data: RulesData, path: Path): string {
  for (let n = path.length - 1; n >= 0; n--) {
    const u = (at(data, path.slice(0, n)) as { unit?: unknown } | undefined)?.unit;
    // The data's units are often words ("N, as driven"); a table keeps only a symbol ahead of them.
    if (typeof u === 'string') return /^[A-Za-z%°/·²³]+$/.test(u.split(',')[0].trim()) ? u.split(',')[0].trim() : '';
  }
  const suffix = path.map(String).find((s) => /_(kPa|MPa|pct|mm|N|kg)$/.test(s));
  return suffix ? suffix.slice(suffix.lastIndexOf('_') + 1) : '';
}

/** Where a data value lives, as a reader finds it: the file, then the path inside it. */
function dataAddress(data: RulesData, path: Path): string {
  const [table, group, ...rest] = path.map(String);
  const inner = [group, ...rest.filter((s, i) => !(s === 'value' && i === rest.length - 1))].join('.');
  const file = table === 'limits' || table === 'params' ? data.files?.[table][group] : data.files?.tables[table];
  return `${file ?? `rules data ${table}`}#${inner}`;
}

/**
 * The input behind a key, if it is one a verdict may hang on: a number the
 * builder left to its default or gave as an estimate, or a data value no
 * printed source was found for. Null for every other input.
 */
export function inputInfo(key: InputKey, spec: CheckedSpecification, entries: readonly SpecEntry[], data: RulesData): InputInfo | null {
  const path = steps(key);
  if (key.startsWith('spec:')) {
    const value = at(spec, path);
    if (typeof value !== 'number') return null;
    const dotted = path.join('.');
    const entry = entries.find((e) => e.path === pathText(path));
    const status: InputStatus | null = entry?.defaulted ? 'defaulted' : builderEstimate(dotted) ? 'given' : null;
    return status && { key, input: dotted, origin: 'spec', value, unit: entry?.unit ?? '', status };
  }
  const value = at(data, path);
  const holder = at(data, path.slice(0, -1)) as { sources?: unknown } | undefined;
  if (typeof value !== 'number' || !Array.isArray(holder?.sources) || !holder.sources.includes('from-memory')) return null;
  return { key, input: dataAddress(data, path), origin: 'data', value, unit: dataUnit(data, path), status: 'from-memory' };
}

/** The specification and data with one input changed. */
export function withInput(key: InputKey, value: number, spec: CheckedSpecification, data: RulesData): { spec: CheckedSpecification; data: RulesData } {
  const path = steps(key);
  return key.startsWith('spec:') ? { spec: setIn(spec, path, value), data } : { spec, data: setIn(data, path, value) };
}

export const stepsOf = steps;
