import type { RulesData } from '../data/rules-data.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { InputKey, ReadTracer } from '../pipeline/read-tracer.ts';

// Views of the specification and the rules data that tell the tracer of every
// value read through them. They hand out views of nested objects (cached, so
// an object read twice is the same object) and the plain values themselves.

type Key = (path: readonly (string | number)[]) => InputKey;

/** Every view handed out: a model value holding one carries the spec or data it was read from. */
const VIEWS = new WeakSet<object>();
export const isRecordingView = (o: object): boolean => VIEWS.has(o);

function recording<T extends object>(root: T, tracer: ReadTracer, keyOf: Key, isLeafValue: (parent: object, prop: string) => boolean): T {
  const views = new WeakMap<object, object>();
  const view = (target: object, path: (string | number)[]): object => {
    const cached = views.get(target);
    if (cached) return cached;
    const p = new Proxy(target, {
      get(t, prop, receiver) {
        const v: unknown = Reflect.get(t, prop, receiver);
        if (typeof prop !== 'string') return v;
        const step = Array.isArray(t) && /^\d+$/.test(prop) ? Number(prop) : prop;
        if (typeof v === 'object' && v !== null) return view(v, [...path, step]);
        if (typeof v !== 'function' && isLeafValue(t, prop)) tracer.input(keyOf([...path, step]));
        return v;
      },
    });
    views.set(target, p);
    VIEWS.add(p);
    return p;
  };
  return view(root, []) as T;
}

/** Spec inputs are keyed by their dotted path, list indices included: `spec:crew.0.x_mm`. */
export const specKey = (path: readonly (string | number)[]): InputKey => `spec:${path.join('.')}`;

/** Data values are keyed by their path in the data with `/` between steps (group names hold dots): `data:params/ride.supports/leg_damping/value`. */
export const dataKey = (path: readonly (string | number)[]): InputKey => `data:${path.join('/')}`;

export function recordingSpec(spec: CheckedSpecification, tracer: ReadTracer): CheckedSpecification {
  return recording(spec, tracer, specKey, () => true);
}

/** Only a sourced number's `value` counts as a data input (its sources and notes are not inputs). */
export function recordingData(data: RulesData, tracer: ReadTracer): RulesData {
  return recording(data, tracer, dataKey, (parent, prop) => prop === 'value' && Array.isArray((parent as { sources?: unknown }).sources));
}
