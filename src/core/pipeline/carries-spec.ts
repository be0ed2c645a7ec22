// A model whose value holds the specification itself, or a part of it (the
// ride's input hands the spec on to the ride model), passes on whatever a
// later reader reads through it. Reused after the spec or the data changed it
// would hand on the old values, so such a model is computed afresh at every
// sweep point and every decisive-input trial. Found once, on the first values.

import { isRecordingView } from '../decisive/recording-proxy.ts';

/** Objects looked at before giving up and counting the value as a carrier (safe: it is then recomputed). */
const BUDGET = 500_000;

export function specObjects(spec: unknown): Set<object> {
  const out = new Set<object>();
  const walk = (n: unknown) => {
    if (typeof n !== 'object' || n === null || out.has(n)) return;
    out.add(n);
    for (const v of Object.values(n)) walk(v);
  };
  walk(spec);
  return out;
}

export function carriesSpec(value: unknown, inSpec: ReadonlySet<object>): boolean {
  const seen = new Set<object>();
  const stack: unknown[] = [value];
  while (stack.length) {
    const n = stack.pop();
    if (typeof n !== 'object' || n === null || seen.has(n) || ArrayBuffer.isView(n)) continue;
    if (inSpec.has(n) || isRecordingView(n)) return true;
    if (seen.size >= BUDGET) return true;
    seen.add(n);
    const children = n instanceof Map ? [...n.keys(), ...n.values()] : n instanceof Set ? [...n] : Object.values(n);
    for (const v of children) stack.push(v);
  }
  return false;
}
