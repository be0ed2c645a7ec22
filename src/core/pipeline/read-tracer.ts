// Who read what while a check ran: each model and each rule, the inputs
// (specification leaves and data values) it read itself and the models it
// asked for. From this the inputs a finding depends on follow, and which
// models a changed input makes stale.

/** `spec:crew.0.x_mm` or `data:params/ride.supports/leg_damping`: one key per input. */
export type InputKey = string;

export class ReadTracer {
  readonly #stack: string[] = [];
  readonly #inputs = new Map<string, Set<InputKey>>();
  readonly #models = new Map<string, Set<string>>();

  /** Reads between enter and leave are laid to this reader (`model:mass`, `rule:member.axle`). */
  enter(reader: string): void {
    this.#stack.push(reader);
  }

  leave(): void {
    this.#stack.pop();
  }

  input(key: InputKey): void {
    const who = this.#stack[this.#stack.length - 1];
    if (who !== undefined) add(this.#inputs, who, key);
  }

  model(id: string): void {
    const who = this.#stack[this.#stack.length - 1];
    if (who !== undefined) add(this.#models, who, `model:${id}`);
  }

  /** Takes over what a reader read in an earlier run (a model reused from it, not computed again). */
  adopt(reader: string, earlier: ReadTracer): void {
    for (const k of earlier.#inputs.get(reader) ?? []) add(this.#inputs, reader, k);
    for (const m of earlier.#models.get(reader) ?? []) add(this.#models, reader, m);
  }

  /** Every input the reader depends on, through the models it asked for, and those models. */
  closure(reader: string): { inputs: Set<InputKey>; models: Set<string> } {
    const inputs = new Set<InputKey>();
    const models = new Set<string>();
    const walk = (r: string) => {
      for (const k of this.#inputs.get(r) ?? []) inputs.add(k);
      for (const m of this.#models.get(r) ?? []) {
        if (models.has(m)) continue;
        models.add(m);
        walk(m);
      }
    };
    walk(reader);
    return { inputs, models };
  }

  /** The models (ids without the prefix) that depend on any of the inputs: stale when one of them changes. */
  staleModels(keys: ReadonlySet<InputKey>): Set<string> {
    const stale = new Set<string>();
    for (const reader of new Set([...this.#inputs.keys(), ...this.#models.keys()])) {
      if (!reader.startsWith('model:')) continue;
      const c = this.closure(reader);
      if ([...c.inputs].some((k) => keys.has(k))) stale.add(reader.slice('model:'.length));
    }
    return stale;
  }
}

function add(map: Map<string, Set<string>>, who: string, what: string): void {
  let s = map.get(who);
  if (!s) map.set(who, (s = new Set()));
  s.add(what);
}
