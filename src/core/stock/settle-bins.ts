import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { downsize } from './downsize.ts';
import { firstFit } from './first-fit.ts';

/**
 * Make a solver's bins cut every piece exactly its quantity: drop surplus
 * pieces (a demand row is "at least"), fill any shortfall by first-fit
 * decreasing, then move each bin to its best stock.
 */
export function settleBins(p: CuttingProblem, bins: Bin[]): { bins: Bin[]; unplaced: number[]; repaired: number } {
  const surplus = p.types.map((t) => -t.demand);
  for (const b of bins) for (const i of b.items) surplus[i]++;
  // Drop from the last bins first: they tend to be the emptiest.
  const trimmed = bins.map((b) => ({ stock: b.stock, items: [...b.items] }));
  for (let k = trimmed.length - 1; k >= 0; k--) {
    trimmed[k].items = trimmed[k].items.filter((i) => (surplus[i] > 0 ? (surplus[i]--, false) : true));
  }
  const missing = surplus.flatMap((s, i) => (s < 0 ? Array<number>(-s).fill(i) : []));
  const filled = firstFit(
    p,
    trimmed.filter((b) => b.items.length > 0),
    missing,
  );
  return { bins: downsize(p, filled.bins), unplaced: filled.unplaced, repaired: missing.length - filled.unplaced.length };
}
