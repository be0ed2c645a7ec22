import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { CuttingPattern, CuttingPlan } from './cutting-types.ts';
import { roundUpBound } from './objective-step.ts';

export interface PlanFacts {
  lower_bound: number;
  /** The LP relaxation's bound where an LP was solved on the exact grid, else null. */
  lp_value: number | null;
  /** The solver proved the plan optimal (beyond meeting the bound). */
  proved: boolean;
  method: string;
  baseline: CuttingPlan['baseline'];
}

const tidy = (x: number) => Math.round(x * 1e6) / 1e6;

/** The plan a set of bins stands for: labelled patterns, stock bought, waste, bound and gap. */
export function planFromBins(p: CuttingProblem, bins: Bin[], facts: PlanFacts): CuttingPlan {
  const queues = p.types.map((t) => t.labels.map((l) => ({ ...l })));
  const nextLabel = (i: number): string => {
    const q = queues[i];
    while (q.length > 1 && q[0].quantity <= 0) q.shift();
    q[0].quantity--;
    return q[0].label;
  };
  const patterns = new Map<string, CuttingPattern>();
  let bought_mm = 0;
  let cut_mm = 0;
  for (const b of bins) {
    const stock = p.stocks[b.stock];
    // Longest first: a mis-cut then still leaves the most wood for the rest.
    const cuts = [...b.items].sort((x, y) => x - y).map((i) => ({ label: nextLabel(i), length_mm: p.types[i].length_mm }));
    const used = cuts.reduce((s, c) => s + c.length_mm + p.kerf_mm, 0);
    // The last cut needs no kerf when the piece runs to the end of the stock.
    const offcut_mm = Math.max(0, tidy(stock.length_mm - used));
    const key = `${stock.length_mm}|${cuts.map((c) => `${c.length_mm}:${c.label}`).join(',')}`;
    const had = patterns.get(key);
    if (had) had.count++;
    else patterns.set(key, { stock_length_mm: stock.length_mm, count: 1, cuts, offcut_mm });
    bought_mm += stock.length_mm;
    cut_mm += cuts.reduce((s, c) => s + c.length_mm, 0);
  }
  const bought = p.stocks
    .map((s, k) => ({ s, count: bins.filter((b) => b.stock === k).length }))
    .filter((x) => x.count > 0)
    .map(({ s, count }) => ({ length_mm: s.length_mm, count, cost: s.price === null ? null : tidy(s.price * count) }));
  const objective = binsObjective(p, bins);
  const lb = facts.lower_bound;
  const waste_mm = tidy(bought_mm - cut_mm);
  const lpBound = facts.lp_value === null ? null : tidy(roundUpBound(facts.lp_value, p.step));
  return {
    pieces_used: bins.length,
    cost: p.priced ? tidy(objective) : null,
    lower_bound: tidy(lb),
    optimal: facts.proved || objective <= roundUpBound(lb, p.step) + 1e-9,
    gap: lb > 0 ? tidy((objective - lb) / lb) : 0,
    lp_value: facts.lp_value === null ? null : tidy(facts.lp_value),
    lp_bound: lpBound,
    lp_gap: lpBound === null ? null : tidy(objective - lpBound),
    patterns: [...patterns.values()].sort((a, b) => b.stock_length_mm - a.stock_length_mm || b.count - a.count),
    bought,
    waste_mm,
    waste_pct: bought_mm > 0 ? tidy((100 * waste_mm) / bought_mm) : 0,
    method: facts.method,
    baseline: facts.baseline,
  };
}
