import type { InputKey } from '../pipeline/read-tracer.ts';
import type { KeyPath } from '../spec/input-issue.ts';

// What a point of a sweep changed against the design point, as the input keys
// the read tracer uses. Compared leaf by leaf after the point's spec is
// prepared, so a value the preparation computes from a varied one (the floor's
// height from the axle's depth) counts as changed too.

export function changedKeys(base: unknown, point: unknown): Set<InputKey> {
  const out = new Set<InputKey>();
  walk(base, point, 'spec:', out);
  return out;
}

/** `key` is the input key of the node so far, ending in its separator ('spec:' at the root, 'spec:crew.0.' below). */
function walk(a: unknown, b: unknown, key: string, out: Set<InputKey>): void {
  if (typeof a !== 'object' || a === null || typeof b !== 'object' || b === null) {
    if (!Object.is(a, b)) out.add(key.slice(0, -1));
    return;
  }
  if (Array.isArray(a) && Array.isArray(b) && a.length !== b.length) out.add(`${key}length`);
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  for (const k in ra) walk(ra[k], rb[k], `${key}${k}.`, out);
  for (const k in rb) if (!(k in ra)) out.add(`${key}${k}`);
}

/** A copy of root with the value at path set; objects missing on the way are made (a value left to its default). */
export function setPath(root: unknown, path: KeyPath, value: unknown): unknown {
  if (path.length === 0) return value;
  const [head, ...rest] = path;
  const node: object = typeof root === 'object' && root !== null ? root : {};
  const copy = (Array.isArray(node) ? [...(node as unknown[])] : { ...node }) as Record<string | number, unknown>;
  copy[head] = setPath((node as Record<string | number, unknown>)[head], rest, value);
  return copy;
}

/** The value at an input key's path (`spec:crew.0.x_mm`; `spec:crew.length` gives the list's length). */
export { valueAt as valueAtKey } from '../input/spec-values.ts';

/** The path steps of a spec input's key: `spec:crew.0.x_mm` to crew, 0, x_mm (a list index stays text: it reads the same). */
export const keySteps = (k: InputKey): string[] => k.slice('spec:'.length).split('.');
