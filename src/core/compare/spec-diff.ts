import { unitOfKey } from '../units/units.ts';
import type { SpecDifference } from './compare-result.ts';

// The structural difference of prepared specifications: every leaf (a
// number, a word, a list of plain values) whose value is not the same in
// all of them, by its dotted path. A part one build has and another lacks
// (a second crew member, a load) is one difference, the whole part.

type Node = unknown;

/** An object or a list of objects (an empty list too: it may hold what another build's holds); a list of plain values is a leaf. */
const isBranch = (v: Node): v is Record<string, unknown> | unknown[] =>
  typeof v === 'object' && v !== null && !(Array.isArray(v) && v.length > 0 && v.every((x) => typeof x !== 'object' || x === null));

/** The unit of a path: its last named key's (`x_mm` is mm). */
function unitOf(path: readonly (string | number)[]): string {
  const key = [...path].reverse().find((p): p is string => typeof p === 'string');
  return key ? (unitOfKey(key)?.symbol ?? '') : '';
}

function same(a: Node, b: Node): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/** The values at which the specifications differ, in the order of the first one's keys (then any the others add). */
export function diffSpecs(specs: readonly unknown[]): SpecDifference[] {
  const out: SpecDifference[] = [];
  const walk = (nodes: Node[], path: (string | number)[]) => {
    const present = nodes.filter((n) => n !== undefined);
    if (present.length === nodes.length && present.every(isBranch) && present.every((n) => Array.isArray(n) === Array.isArray(present[0]))) {
      const keys: string[] = [];
      for (const n of present) for (const k of Object.keys(n)) if (!keys.includes(k)) keys.push(k);
      const list = Array.isArray(present[0]);
      for (const k of keys) walk(nodes.map((n) => (n as Record<string, unknown>)[k]), [...path, list ? Number(k) : k]);
      return;
    }
    if (nodes.every((n) => same(n, nodes[0]))) return;
    out.push({ path: path.join('.'), unit: unitOf(path), values: nodes.map((n) => (n === undefined ? null : n)) });
  };
  walk([...specs], []);
  return out;
}
