import schema from '../spec/spec.schema.json' with { type: 'json' };
import type { InputInfo } from './input-path.ts';
import { stepsOf } from './input-path.ts';

// How far the search may move an input: the schema's range for a spec value,
// and never beyond a tenth to ten times the value as checked (a guess that is
// out by more than that is not a guess any more).

type Node = Record<string, unknown>;
const DEFS = (schema as unknown as Node).$defs as Record<string, Node>;

function resolve(node: Node): Node {
  const ref = node.$ref;
  if (typeof ref !== 'string') return node;
  const { $ref: _ignored, ...own } = node;
  return { ...resolve(DEFS[ref.replace('#/$defs/', '')]), ...own };
}

function schemaAt(path: (string | number)[]): Node | undefined {
  let node: Node | undefined = resolve(schema);
  for (const s of path) {
    if (!node) return undefined;
    const next: unknown = typeof s === 'number' ? node.items : (node.properties as Record<string, unknown> | undefined)?.[s];
    node = typeof next === 'object' && next !== null ? resolve(next as Node) : undefined;
  }
  return node;
}

export interface InputRange {
  low: number;
  high: number;
  integer: boolean;
  /** Words for the range, for a reason where nothing in it changes the severity. */
  text: string;
}

/** The fraction and multiple of the checked value the search stays within. */
export const SPAN = 10;

export function inputRange(info: InputInfo): InputRange | null {
  const v = info.value;
  if (v === 0) return null;
  let low = v > 0 ? v / SPAN : v * SPAN;
  let high = v > 0 ? v * SPAN : v / SPAN;
  let integer = false;
  if (info.origin === 'spec') {
    const node = schemaAt(stepsOf(info.key));
    integer = node?.type === 'integer';
    const min = typeof node?.minimum === 'number' ? node.minimum : undefined;
    const exMin = typeof node?.exclusiveMinimum === 'number' ? node.exclusiveMinimum : undefined;
    const max = typeof node?.maximum === 'number' ? node.maximum : undefined;
    if (min !== undefined) low = Math.max(low, min);
    if (exMin !== undefined && low <= exMin) low = exMin + Math.abs(v) * 1e-3;
    if (max !== undefined) high = Math.min(high, max);
  }
  if (integer) {
    low = Math.ceil(low);
    high = Math.floor(high);
  }
  if (!(low < high)) return null;
  return { low, high, integer, text: `${info.origin === 'spec' ? 'the range the specification allows, within ' : ''}a tenth to ten times the value checked` };
}
