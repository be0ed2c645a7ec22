import { pathText, type KeyPath } from '../spec/input-issue.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { parseQuantity } from '../units/parse-quantity.ts';
import { unitOfKey } from '../units/units.ts';

// One varied value of a sweep, from `--vary PATH=FROM..TO:N`: the spec path
// as the user writes it (axle.x_mm, crew[0].x_mm), the range in the unit the
// spec takes there (a plain number, or a quantity with its unit: 6in), and
// the count of values across the range.

export interface SweepAxis {
  /** The path as a reader types it: `crew[0].x_mm`. */
  path: string;
  steps: KeyPath;
  from: number;
  to: number;
  /** Values across the range: the grid's count, or the count along the envelope's line in a Latin hypercube. */
  count: number;
  /** The unit the spec takes there (its key's suffix), '' for a plain number. */
  unit: string;
}

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/** At most this many values along one varied value, and points in one sweep. */
export const MAX_COUNT = 1000;
export const MAX_POINTS = 1_000_000;
export const MAX_AXES = 3;

const FORM = 'write it PATH=FROM..TO:N, e.g. --vary axle.x_mm=150..350:21 or --vary crew[0].x_mm=200..450:11';
const PATH = /^[A-Za-z_][A-Za-z0-9_]*(?:\[\d+\]|\.[A-Za-z_][A-Za-z0-9_]*|\.\d+)*$/;
const NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;

const refuse = <T>(message: string): Parsed<T> => ({ ok: false, message });

/** `crew[0].x_mm` or `crew.0.x_mm` to its steps. */
export function pathSteps(text: string): KeyPath | null {
  if (!PATH.test(text)) return null;
  return [...text.matchAll(/[A-Za-z_][A-Za-z0-9_]*|\d+/g)].map((m) => (/^\d+$/.test(m[0]) ? Number(m[0]) : m[0]));
}

function at(root: unknown, steps: KeyPath): unknown {
  let node = root;
  for (const s of steps) node = typeof node === 'object' && node !== null ? (node as Record<string | number, unknown>)[s] : undefined;
  return node;
}

/** The numbers one level down, as a hint of what a wrong path could have meant. */
function numbersBeside(spec: unknown, steps: KeyPath): string {
  for (let n = steps.length - 1; n >= 0; n--) {
    const node = at(spec, steps.slice(0, n));
    if (typeof node !== 'object' || node === null || Array.isArray(node)) continue;
    const names = Object.entries(node).filter(([, v]) => typeof v === 'number').map(([k]) => pathText([...steps.slice(0, n), k]));
    if (names.length) return `; numbers there: ${names.join(', ')}`;
  }
  return '';
}

function readValue(text: string, key: string, unitKey: string, what: 'FROM' | 'TO'): Parsed<number> {
  const t = text.trim();
  if (NUMBER.test(t)) return { ok: true, value: Number(t) };
  const unit = unitOfKey(unitKey);
  if (!unit) return refuse(`option --vary ${key}: ${what} "${t}" is not a number (${unitKey} takes a plain number)`);
  const q = parseQuantity(t, unit);
  return q.ok ? { ok: true, value: q.value } : refuse(`option --vary ${key}: ${what} ${q.reason}; give a number in ${unit.symbol} or a quantity such as 6in`);
}

/**
 * One `--vary` value read against the checked specification: the path must
 * reach a number there (a value the user left to its default counts), the
 * range must be finite with FROM no more than TO, and N whole from 1 to MAX_COUNT.
 */
export function parseVary(text: string, spec: CheckedSpecification): Parsed<SweepAxis> {
  const eq = text.indexOf('=');
  if (eq < 0) return refuse(`option --vary "${text}" has no "=": ${FORM}`);
  const key = text.slice(0, eq).trim();
  const m = /^(.+?)\.\.(.+?)(?::(.*))?$/.exec(text.slice(eq + 1).trim());
  if (!m) return refuse(`option --vary "${text}": the range must be FROM..TO:N; ${FORM}`);
  const steps = pathSteps(key);
  if (!steps) return refuse(`option --vary "${text}": "${key}" is not a spec path; a path is names joined by dots, a list entry in brackets: axle.x_mm, crew[0].x_mm`);
  const path = pathText(steps);
  const value = at(spec, steps);
  if (value === undefined) return refuse(`option --vary ${path}: the specification has no value there${numbersBeside(spec, steps)}`);
  if (typeof value !== 'number') return refuse(`option --vary ${path}: the value there is ${typeof value === 'object' ? 'a group of values' : `${typeof value} (${JSON.stringify(value)})`}, not a number; a sweep varies numbers`);
  const last = String(steps.findLast((s) => typeof s === 'string'));
  const from = readValue(m[1], path, last, 'FROM');
  if (!from.ok) return from;
  const to = readValue(m[2], path, last, 'TO');
  if (!to.ok) return to;
  if (!Number.isFinite(from.value) || !Number.isFinite(to.value)) return refuse(`option --vary ${path}: FROM and TO must be finite numbers`);
  if (from.value > to.value) return refuse(`option --vary ${path}: FROM (${from.value}) is more than TO (${to.value}); give the range low to high`);
  if (m[3] === undefined) return refuse(`option --vary ${path}: give the count of values after the range, :N (e.g. ${key}=${m[1]}..${m[2]}:11)`);
  const nText = m[3].trim();
  const count = /^\d+$/.test(nText) ? Number(nText) : NaN;
  if (!Number.isInteger(count) || count < 1 || count > MAX_COUNT) return refuse(`option --vary ${path}: N "${nText}" must be a whole number from 1 to ${MAX_COUNT}`);
  if (count === 1 && from.value !== to.value) return refuse(`option --vary ${path}: one value (N = 1) takes FROM equal to TO`);
  if (count > 1 && from.value === to.value) return refuse(`option --vary ${path}: FROM equals TO, so there is one value: give N = 1`);
  return { ok: true, value: { path, steps, from: from.value, to: to.value, count, unit: unitOfKey(last)?.symbol ?? '' } };
}

/** Every `--vary` given: one to three, each path once. */
export function parseVaries(texts: readonly string[], spec: CheckedSpecification): Parsed<SweepAxis[]> {
  if (texts.length === 0) return refuse(`give one to ${MAX_AXES} values to vary with --vary: ${FORM}`);
  if (texts.length > MAX_AXES) return refuse(`option --vary is given ${texts.length} times; a sweep varies one to ${MAX_AXES} values`);
  const axes: SweepAxis[] = [];
  for (const t of texts) {
    const a = parseVary(t, spec);
    if (!a.ok) return a;
    if (axes.some((b) => b.path === a.value.path)) return refuse(`option --vary ${a.value.path} is given twice; vary each value once`);
    axes.push(a.value);
  }
  return { ok: true, value: axes };
}

/** The count-th value of an axis's evenly spaced values. */
export function axisValue(axis: SweepAxis, i: number): number {
  if (axis.count === 1) return axis.from;
  // The ends exactly as given, not through the step.
  if (i === axis.count - 1) return axis.to;
  return axis.from + ((axis.to - axis.from) * i) / (axis.count - 1);
}

export const axisValues = (axis: SweepAxis): number[] => Array.from({ length: axis.count }, (_, i) => axisValue(axis, i));
