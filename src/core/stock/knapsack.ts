// Bounded knapsack by dynamic programming: the pricing step of column
// generation. Each item's bound is split into 1, 2, 4, ... copies so the
// table stays 0/1; one table answers every stock length at once.

export interface KnapsackItem {
  size: number;
  value: number;
  bound: number;
}

export interface KnapsackBest {
  value: number;
  /** Copies of each item. */
  counts: number[];
}

/** For each capacity, the most valuable choice whose sizes sum to at most it; `cells` is the table's work. */
export function boundedKnapsack(items: KnapsackItem[], capacities: number[]): { best: KnapsackBest[]; cells: number } {
  const top = Math.max(0, ...capacities);
  const parts: { item: number; copies: number; size: number; value: number }[] = [];
  items.forEach((it, item) => {
    if (it.value <= 0 || it.size > top) return;
    let left = Math.min(it.bound, Math.floor(top / it.size));
    for (let copies = 1; left > 0; copies *= 2) {
      const c = Math.min(copies, left);
      parts.push({ item, copies: c, size: c * it.size, value: c * it.value });
      left -= c;
    }
  });
  const best = new Float64Array(top + 1);
  const took = parts.map(() => new Uint8Array(top + 1));
  let cells = 0;
  parts.forEach((part, j) => {
    const row = took[j];
    cells += top + 1 - part.size;
    for (let c = top; c >= part.size; c--) {
      const v = best[c - part.size] + part.value;
      if (v > best[c] + 1e-12) {
        best[c] = v;
        row[c] = 1;
      }
    }
  });
  const answers = capacities.map((cap) => {
    const counts = items.map(() => 0);
    let c = Math.min(cap, top);
    const value = c >= 0 ? best[c] : 0;
    for (let j = parts.length - 1; j >= 0 && c > 0; j--) {
      if (took[j][c]) {
        counts[parts[j].item] += parts[j].copies;
        c -= parts[j].size;
      }
    }
    return { value, counts };
  });
  return { best: answers, cells };
}
