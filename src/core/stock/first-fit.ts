import { binLoad, stockUse, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { FirstRoom } from './first-room.ts';

/**
 * First-fit decreasing: each piece, longest first, goes into the first stock
 * piece already opened that still holds it, else opens a new one. The bins
 * given are filled first, so the same routine repairs a shortfall.
 */
export function firstFit(p: CuttingProblem, start: Bin[], items: number[]): { bins: Bin[]; unplaced: number[] } {
  const bins = start.map((b) => ({ stock: b.stock, items: [...b.items] }));
  const free = new FirstRoom(bins.length + items.length);
  for (const b of bins) free.push(p.stocks[b.stock].capacity - binLoad(p, b));
  const left = stockUse(p, bins).map((n, s) => p.stocks[s].available - n);
  const unplaced: number[] = [];
  // Type indices run longest first.
  for (const i of [...items].sort((a, b) => a - b)) {
    const size = p.types[i].size;
    let at = free.first(size);
    if (at < 0) {
      const s = newStock(p, size, left);
      if (s < 0) {
        unplaced.push(i);
        continue;
      }
      left[s]--;
      bins.push({ stock: s, items: [] });
      at = free.push(p.stocks[s].capacity);
    }
    bins[at].items.push(i);
    free.set(at, free.get(at) - size);
  }
  return { bins, unplaced };
}

// By count, the longest stock that holds the piece; by cost, the cheapest per
// length. Either way each bin is moved to the best stock afterwards (downsize).
function newStock(p: CuttingProblem, size: number, left: number[]): number {
  let best = -1;
  for (let s = 0; s < p.stocks.length; s++) {
    const st = p.stocks[s];
    if (st.capacity < size || left[s] <= 0) continue;
    if (best < 0) {
      best = s;
      continue;
    }
    const b = p.stocks[best];
    const better = p.priced ? st.weight * b.capacity < b.weight * st.capacity || (st.weight * b.capacity === b.weight * st.capacity && st.capacity > b.capacity) : st.capacity > b.capacity;
    if (better) best = s;
  }
  return best;
}

/** Every piece of the problem, one entry per piece, as type indices. */
export function allItems(p: CuttingProblem): number[] {
  return p.types.flatMap((t, i) => Array<number>(t.demand).fill(i));
}
