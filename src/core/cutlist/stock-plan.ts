import { planCutting } from '../stock/plan-cutting.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import type { StockPlan } from './cutting-result.ts';
import type { CuttingGroup, UnservedPart } from './group-parts.ts';

/** Solve each group and total the plan; the cost is the sum where every group is priced. */
export function stockPlan(groups: CuttingGroup[], unserved: UnservedPart[], lp: LpSolver | undefined): StockPlan {
  const planned = groups.map((g) => ({ species: g.species, section: g.section, plan: planCutting(g.instance, lp) }));
  const bought = planned.reduce((s, g) => s + g.plan.bought.reduce((t, b) => t + b.length_mm * b.count, 0), 0);
  const waste = planned.reduce((s, g) => s + g.plan.waste_mm, 0);
  const priced = planned.length > 0 && planned.every((g) => g.plan.cost !== null);
  return {
    groups: planned,
    pieces: planned.reduce((s, g) => s + g.plan.pieces_used, 0),
    cost: priced ? planned.reduce((s, g) => s + g.plan.cost!, 0) : null,
    waste_pct: bought > 0 ? (100 * waste) / bought : 0,
    unserved,
  };
}
