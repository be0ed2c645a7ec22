import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { CuttingPlan } from './cutting-types.ts';
import { downsize } from './downsize.ts';
import { roundUpBound } from './objective-step.ts';
import { patternSearch, searchable } from './pattern-search.ts';
import { planFromBins } from './plan-from-bins.ts';
import { smallPatternLp } from './small-pattern-lp.ts';
import type { WorkMeter } from './work-meter.ts';

/** The method text of a first-fit plan the search proved optimal (it met no bound, but nothing does better). */
export const FIRST_FIT_PROVED = 'first-fit decreasing, proved optimal by pattern search';
export const SEARCH_PROVED = 'pattern search, proved optimal';

/**
 * The plan of a small problem on an exact grid without the LP solver: the
 * pattern LP on the dense simplex for the bound, first-fit decreasing where
 * it meets that bound rounded up, else the exact pattern search. Null where
 * the problem is too big for either, or either ran out of work: the caller
 * then plans it with the LP solver. The plan is the one column generation
 * would prove or better, at a tie possibly with other patterns.
 */
export function planSmall(p: CuttingProblem, ffdBins: Bin[] | null, simple: number, meter: WorkMeter, baseline: CuttingPlan['baseline']): CuttingPlan | null {
  if (!p.grid.exact || p.types.length === 0 || !searchable(p)) return null;
  const lpValue = smallPatternLp(p, ffdBins, meter);
  if (lpValue === null) return null;
  const facts = { lower_bound: Math.max(simple, lpValue), lp_value: lpValue, baseline };
  const ffd = ffdBins ? binsObjective(p, ffdBins) : Infinity;
  if (ffdBins && ffd <= roundUpBound(facts.lower_bound, p.step) + 1e-9) return planFromBins(p, ffdBins, { ...facts, proved: false, method: 'first-fit decreasing' });
  const found = patternSearch(p);
  if (!found) return null;
  const bins = downsize(p, found);
  // First-fit's plan stands where it is as good: the plan a reader already has from it.
  if (ffdBins && ffd <= binsObjective(p, bins) + 1e-9) return planFromBins(p, ffdBins, { ...facts, proved: true, method: FIRST_FIT_PROVED });
  return planFromBins(p, bins, { ...facts, proved: true, method: SEARCH_PROVED });
}
