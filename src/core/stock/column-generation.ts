import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { LpSolver } from './cutting-types.ts';
import { dive } from './dive.ts';
import { roundUpBound } from './objective-step.ts';
import { PatternMaster } from './pattern-master.ts';
import { settleBins } from './settle-bins.ts';
import type { SolverOutcome } from './solver-outcome.ts';
import type { WorkMeter } from './work-meter.ts';

// Column generation (Gilmore and Gomory, Operations Research 9 (1961) and 11
// (1963)): the LP master priced to optimality by a bounded knapsack gives the
// bound; a dive then fixes patterns and prices again on what is left, which
// both finds a plan and generates patterns for residual demands that the root
// never prices; last, where the bound is still not met, a MIP over every
// pattern generated, started from the best plan so far. A MIP over generated
// patterns proves nothing beyond meeting the bound. Every step draws on one
// work meter, so where it stops does not depend on the machine.

interface Best {
  bins: Bin[];
  how: string;
  repaired: boolean;
}

export function columnGeneration(p: CuttingProblem, lp: LpSolver, meter: WorkMeter, start: Bin[] | null): SolverOutcome {
  const master = new PatternMaster(p, lp, start, meter);
  let best: Best | null = start ? { bins: start, how: 'first-fit decreasing', repaired: false } : null;
  const objective = () => (best ? binsObjective(p, best.bins) : Infinity);
  // `completes`: first-fit finishing the bins is part of the method (the dive's residual rounding), not a repair.
  const offer = (bins: Bin[] | null, how: string, completes = false): number => {
    if (!bins) return objective();
    const s = settleBins(p, bins);
    if (s.unplaced.length === 0 && binsObjective(p, s.bins) < objective() - 1e-9) best = { bins: s.bins, how, repaired: !completes && s.repaired > 0 };
    return objective();
  };
  try {
    const root = master.converge();
    const bound = root?.bound ?? null;
    const target = bound !== null ? roundUpBound(bound, p.step) : -Infinity;
    if (objective() > target + 1e-9) dive(p, master, { best: objective(), target, offer: (bins) => offer(bins, 'column generation + diving, the residual by first-fit', true) });
    if (objective() > target + 1e-9 && !meter.exhausted('mipNodes')) {
      master.restore();
      if (best) master.include(best.bins);
      offer(master.mip(best?.bins ?? null), 'column generation + MIP');
    }
    const found: Best | null = best;
    return { bins: found?.bins ?? null, lowerBound: bound, proved: false, repaired: found?.repaired ?? false, method: found?.how ?? 'column generation' };
  } finally {
    master.dispose();
  }
}

/** The LP bound alone (for a plan already known to meet the length bound). */
export function patternLpBound(p: CuttingProblem, lp: LpSolver, meter: WorkMeter, start: Bin[] | null): number | null {
  const master = new PatternMaster(p, lp, start, meter);
  try {
    return master.converge()?.bound ?? null;
  } finally {
    master.dispose();
  }
}
