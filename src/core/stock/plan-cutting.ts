import { binsObjective, type Bin } from './bin.ts';
import { patternLpBound } from './column-generation.ts';
import { prepareProblem, type CuttingProblem } from './cutting-problem.ts';
import type { CuttingInstance, CuttingPlan, LpSolver } from './cutting-types.ts';
import { downsize } from './downsize.ts';
import { allItems, firstFit } from './first-fit.ts';
import { roundUpBound } from './objective-step.ts';
import { planFromBins } from './plan-from-bins.ts';
import { simpleBound } from './simple-bound.ts';
import { planSmall } from './small-plan.ts';
import { solveExactly, type ExactMethod } from './solve-exactly.ts';
import { StockShortfallError } from './stock-shortfall.ts';
import { DEFAULT_WORK_LIMITS, WorkMeter, type WorkLimits } from './work-meter.ts';

export type CuttingMethod = ExactMethod | 'first-fit decreasing';

/** Measured better on the OR-Library u120 and u250 sets (bench/stock-planner.ts, DEVELOPERS.md). */
export const DEFAULT_METHOD: CuttingMethod = 'column generation';

export interface PlanOptions {
  /** Work limits for the whole plan (counts, not time: the same input gives the same plan on any machine). */
  work?: Partial<WorkLimits>;
  method?: CuttingMethod;
}

/**
 * The stock plan of one cutting problem. Without a solver (or with the
 * first-fit method) it is first-fit decreasing; with one, the chosen exact
 * method within the work limits, its shortfall repaired by first-fit, and
 * never worse than first-fit alone.
 */
export function planCutting(instance: CuttingInstance, lp: LpSolver | undefined, opts: PlanOptions = {}): CuttingPlan {
  const meter = new WorkMeter({ ...DEFAULT_WORK_LIMITS, ...opts.work });
  const method = lp ? (opts.method ?? DEFAULT_METHOD) : 'first-fit decreasing';
  const p = prepareProblem(instance);
  const ffd = firstFit(p, [], allItems(p));
  const ffdBins = ffd.unplaced.length === 0 ? downsize(p, ffd.bins) : null;
  const baseline = baselineOf(p, ffdBins);
  const simple = simpleBound(p);
  // Without a method asked for, a small problem needs no LP solver (small-plan.ts).
  const small = lp && opts.method === undefined ? planSmall(p, ffdBins, simple, meter, baseline) : null;
  if (small) return small;
  const meetsBound = ffdBins !== null && binsObjective(p, ffdBins) <= roundUpBound(simple, p.step) + 1e-9;
  if (method === 'first-fit decreasing' || meetsBound || p.types.length === 0) {
    if (!ffdBins) throw new StockShortfallError(p, ffd.unplaced);
    // Already optimal; with a solver the bound shown is still the LP's.
    const bound = lp && p.grid.exact && p.types.length > 0 ? guarded(() => patternLpBound(p, lp, meter, ffdBins)) : null;
    const lpValue = typeof bound === 'number' ? bound : null;
    const note = bound !== null && typeof bound === 'object' ? ` (no LP bound: ${bound.failed})` : '';
    return planFromBins(p, ffdBins, { lower_bound: Math.max(simple, lpValue ?? 0), lp_value: lpValue, proved: false, method: `first-fit decreasing${note}`, baseline });
  }
  const outcome = guarded(() => solveExactly(p, lp!, method, meter, ffdBins));
  if ('failed' in outcome) {
    // The solver's fault is not the plan's: first-fit decreasing stands, with the length bound.
    if (!ffdBins) throw new StockShortfallError(p, ffd.unplaced);
    return planFromBins(p, ffdBins, { lower_bound: simple, lp_value: null, proved: false, method: `first-fit decreasing (${outcome.failed})`, baseline });
  }
  const solved = outcome.bins;
  // Off an exact grid the solver's bound belongs to a coarser problem.
  const lpValue = p.grid.exact ? outcome.lowerBound : null;
  const bound = lpValue !== null ? Math.max(lpValue, simple) : simple;
  const pick = choose(p, solved, ffdBins);
  if (!pick) throw new StockShortfallError(p, ffd.unplaced);
  const fromSolver = pick === solved;
  const repaired = fromSolver && outcome.repaired;
  return planFromBins(p, pick, {
    lower_bound: bound,
    lp_value: lpValue,
    proved: fromSolver && outcome.proved && !repaired && p.grid.exact,
    method: fromSolver ? `${outcome.method}${repaired ? ', repaired by first-fit decreasing' : ''}` : `first-fit decreasing (${outcome.method} found nothing better within its work limits)`,
    baseline,
  });
}

/** A solver call, or what went wrong inside it (the LP solver can fail where its model is not solved). */
function guarded<T>(f: () => T): T | { failed: string } {
  try {
    return f();
  } catch (e) {
    return { failed: `the LP solver failed: ${e instanceof Error ? e.message : String(e)}` };
  }
}

function choose(p: CuttingProblem, a: Bin[] | null, b: Bin[] | null): Bin[] | null {
  if (!a || !b) return a ?? b;
  return binsObjective(p, a) <= binsObjective(p, b) + 1e-9 ? a : b;
}

// Where first-fit cannot keep within the stock available, its baseline is
// the same first-fit with the limits lifted: a count to compare, not a plan.
function baselineOf(p: CuttingProblem, bins: Bin[] | null): CuttingPlan['baseline'] {
  const lifted = { ...p, stocks: p.stocks.map((s) => ({ ...s, available: Infinity })) };
  const base = bins ?? downsize(lifted, firstFit(lifted, [], allItems(lifted)).bins);
  return { pieces_used: base.length, cost: p.priced ? Math.round(binsObjective(p, base) * 1e6) / 1e6 : null };
}
