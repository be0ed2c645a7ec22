import { binLoad, stockUse, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';

/**
 * Move each stock piece's cuts to the cheapest stock that still holds them
 * (by count: the shortest), within what is available. Never worse, and it
 * turns spare length into less waste.
 */
export function downsize(p: CuttingProblem, bins: Bin[]): Bin[] {
  const left = stockUse(p, bins).map((n, s) => p.stocks[s].available - n);
  // Fullest first, so the tight stock goes where it is needed most.
  const order = bins.map((b, k) => ({ k, load: binLoad(p, b) })).sort((a, b) => b.load - a.load);
  const out = bins.map((b) => ({ ...b }));
  for (const { k, load } of order) {
    const cur = out[k].stock;
    let best = cur;
    for (let s = 0; s < p.stocks.length; s++) {
      const st = p.stocks[s];
      if (s === cur || st.capacity < load || left[s] <= 0) continue;
      const b = p.stocks[best];
      if (st.weight < b.weight || (st.weight === b.weight && st.capacity < b.capacity)) best = s;
    }
    if (best !== cur) {
      left[cur]++;
      left[best]--;
      out[k].stock = best;
    }
  }
  return out;
}
