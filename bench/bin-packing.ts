import type { CuttingInstance } from '../src/core/stock/cutting-types.ts';

/** One bin-packing instance: items of whole sizes, bins of one capacity, and the count the planner should reach. */
export interface BinPacking {
  name: string;
  capacity: number;
  sizes: number[];
  /** The proved optimum, or the target the set sets (ceil(sum / capacity) for the generated sets). */
  target: number;
}

/** ceil(sum of sizes / capacity): no packing uses fewer bins. */
export const lengthBound = (b: { capacity: number; sizes: number[] }): number => Math.ceil(b.sizes.reduce((s, x) => s + x, 0) / b.capacity);

/** Bin packing is cutting stock with one stock length, no kerf and demand one per item. */
export function asInstance(b: BinPacking): CuttingInstance {
  const counts = new Map<number, number>();
  for (const s of b.sizes) counts.set(s, (counts.get(s) ?? 0) + 1);
  return { kerf_mm: 0, stock: [{ length_mm: b.capacity }], pieces: [...counts].map(([length_mm, quantity]) => ({ length_mm, quantity })) };
}
