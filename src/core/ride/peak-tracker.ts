import { PeakSet } from './peak-set.ts';

// The largest value of one quantity recorded at points in time order, its
// peaks refined as PeakSet refines them (peak-set.ts): for a caller that
// records one quantity at a time.

export class PeakTracker {
  readonly #set = new PeakSet(1);

  get max(): number {
    return this.#set.max[0];
  }

  add(t: number, g: number): void {
    this.#set.value[0] = g;
    this.#set.add(t);
  }
}
