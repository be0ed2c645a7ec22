import type { InputKey } from '../pipeline/read-tracer.ts';
import { specKey } from '../decisive/recording-proxy.ts';

// The specification inputs that differ between two prepared specifications,
// keyed as the read tracer keys them (`spec:axle.height_mm`), so that the
// models and rules reading any of them can be re-run and the rest reused.

export function changedInputs(a: unknown, b: unknown, path: (string | number)[] = [], out = new Set<InputKey>()): Set<InputKey> {
  const isNode = (v: unknown) => typeof v === 'object' && v !== null;
  if (isNode(a) && isNode(b)) {
    const ka = Object.keys(a);
    const kb = Object.keys(b);
    for (const k of new Set([...ka, ...kb])) {
      const step = Array.isArray(a) || Array.isArray(b) ? Number(k) : k;
      changedInputs((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], [...path, step], out);
    }
    return out;
  }
  // A subtree on one side only: each of its leaves changed, and the path itself (a reader may test for it).
  if (isNode(a) || isNode(b)) {
    out.add(specKey(path));
    return changedInputs(isNode(a) ? a : {}, isNode(b) ? b : {}, path, out);
  }
  if (a !== b) out.add(specKey(path));
  return out;
}
