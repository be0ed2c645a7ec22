// An exact cutting-stock solver by exhaustive search, for small instances
// only, written apart from the planner (real lengths, no grid, no LP): every
// piece, longest first, goes into each open stock piece that still holds it
// or opens one of each stock length still available.
import type { CuttingInstance } from '../../src/core/stock/cutting-types.ts';

/** The least cost (or stock count where unpriced); Infinity when no plan exists. */
export function bruteForceOptimum(inst: CuttingInstance): number {
  const k = inst.kerf_mm;
  const priced = inst.stock.every((s) => s.cost !== undefined);
  const items = inst.pieces.flatMap((p) => Array<number>(p.quantity).fill(p.length_mm + k)).sort((a, b) => b - a);
  const left = inst.stock.map((s) => s.available ?? Infinity);
  const free: number[] = [];
  let best = Infinity;
  const search = (n: number, cost: number): void => {
    if (cost >= best - 1e-9) return;
    if (n === items.length) {
      best = cost;
      return;
    }
    const size = items[n];
    const tried = new Set<number>();
    for (let b = 0; b < free.length; b++) {
      // Open pieces with the same room left are interchangeable.
      if (free[b] < size - 1e-9 || tried.has(free[b])) continue;
      tried.add(free[b]);
      free[b] -= size;
      search(n + 1, cost);
      free[b] += size;
    }
    inst.stock.forEach((s, j) => {
      if (left[j] <= 0 || s.length_mm + k < size - 1e-9) return;
      left[j]--;
      free.push(s.length_mm + k - size);
      search(n + 1, cost + (priced ? s.cost! : 1));
      free.pop();
      left[j]++;
    });
  };
  search(0, 0);
  return best;
}

/** A deterministic pseudo-random stream (mulberry32). */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
