// Values computed at earlier points of a sweep, kept by the values of the
// inputs that reached them: a model that reads only one of two varied values
// is computed once per value of it, not once per point. The first kept go
// first once a reader holds its limit (points come in order, so the oldest
// are the least likely to come back).

export class ReuseCache {
  readonly #byReader = new Map<string, Map<string, unknown>>();
  hits = 0;
  misses = 0;

  constructor(readonly perReader: number) {}

  get(reader: string, key: string): unknown {
    const m = this.#byReader.get(reader);
    const v = m?.get(key);
    if (v === undefined) {
      this.misses++;
      return undefined;
    }
    this.hits++;
    return v;
  }

  set(reader: string, key: string, value: unknown): void {
    let m = this.#byReader.get(reader);
    if (!m) this.#byReader.set(reader, (m = new Map<string, unknown>()));
    m.set(key, value);
    if (m.size > this.perReader) m.delete(m.keys().next().value!);
  }
}
