import type { ReadTracer } from './read-tracer.ts';
import type { ModelDef, ModelInputs } from './define-model.ts';
import type { ModelId, ModelValues } from './model-values.ts';

export interface GraphOptions {
  /** Told of every model asked for and laid the reads made while it computes. */
  tracer?: ReadTracer;
  /** Models already computed for these inputs (a re-run keeps those a changed input does not reach). */
  seed?: ReadonlyMap<ModelId, unknown>;
}

/**
 * The models of one check, each computed at most once and only when asked
 * for. A model sees only the models it names; asking for another is a fault
 * in its declaration and says so.
 */
export class ModelGraph {
  readonly #defs: ReadonlyMap<ModelId, ModelDef>;
  readonly #done = new Map<ModelId, unknown>();
  readonly #computing: ModelId[] = [];
  /** Ids in the order they were computed (tests and the bench read it). */
  readonly computed: ModelId[] = [];

  readonly #tracer: ReadTracer | undefined;

  constructor(
    defs: readonly ModelDef[],
    readonly inputs: ModelInputs,
    options: GraphOptions = {},
  ) {
    this.#defs = new Map(defs.map((d) => [d.id, d]));
    this.#tracer = options.tracer;
    for (const [id, v] of options.seed ?? []) this.#done.set(id, v);
  }

  /** Every model computed (or seeded) so far, by id. */
  values(): ReadonlyMap<ModelId, unknown> {
    return new Map(this.#done);
  }

  /** The model being computed now, innermost last (the data recorder attributes reads to it). */
  get current(): ModelId | undefined {
    return this.#computing[this.#computing.length - 1];
  }

  /** A model's value if something has already asked for it, without computing it. */
  peek<K extends ModelId>(id: K): ModelValues[K] | undefined {
    return this.#done.get(id) as ModelValues[K] | undefined;
  }

  get<K extends ModelId>(id: K): ModelValues[K] {
    this.#tracer?.model(id);
    if (this.#done.has(id)) return this.#done.get(id) as ModelValues[K];
    const def = this.#defs.get(id);
    if (!def) throw new Error(`no model "${id}" is defined`);
    if (this.#computing.includes(id)) throw new Error(`models need each other in a circle: ${[...this.#computing, id].join(' -> ')}`);
    this.#computing.push(id);
    this.#tracer?.enter(`model:${id}`);
    try {
      const value = def.compute(this.view(def.needs, `model "${id}"`), this.inputs) as ModelValues[K];
      this.#done.set(id, value);
      this.computed.push(id);
      return value;
    } finally {
      this.#tracer?.leave();
      this.#computing.pop();
    }
  }

  /** An object whose properties are the named models, each computed on first read; any other name throws. */
  view<N extends ModelId>(needs: readonly N[], reader: string): { readonly [P in N]: ModelValues[P] } {
    const allowed = new Set<ModelId>(needs);
    return new Proxy({} as { readonly [P in N]: ModelValues[P] }, {
      get: (_, key) => {
        if (typeof key !== 'string') return undefined;
        if (!allowed.has(key as ModelId)) throw new Error(`${reader} reads the model "${key}" but does not name it in its needs`);
        return this.get(key as ModelId);
      },
      has: (_, key) => allowed.has(key as ModelId),
      ownKeys: () => [...allowed],
      getOwnPropertyDescriptor: (_, key) => (allowed.has(key as ModelId) ? { enumerable: true, configurable: true } : undefined),
    });
  }
}
