import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { LpSolver } from './cutting-types.ts';
import { dive } from './dive.ts';
import { roundUpBound } from './objective-step.ts';
import { PatternMaster } from './pattern-master.ts';
import { settleBins } from './settle-bins.ts';
import type { SolverOutcome } from './solver-outcome.ts';

// Column generation: the LP master priced to optimality gives the bound; a
// dive then fixes patterns and prices again on what is left, which both
// finds a plan and generates patterns for residual demands that the root
// never prices; last, a MIP over every pattern generated, started from the
// best plan so far. A MIP over generated patterns proves nothing beyond
// meeting the bound. (Measured: the dive's patterns are what lets the MIP
// reach the optimum; see DEVELOPERS.md.)

/** Shares of the time left: the root LP, then the dive; the MIP has the rest. */
const SHARE = { root: 0.4, dive: 0.5 };

interface Best {
  bins: Bin[];
  how: string;
  repaired: boolean;
}

export function columnGeneration(p: CuttingProblem, lp: LpSolver, deadline: number, start: Bin[] | null): SolverOutcome {
  const master = new PatternMaster(p, lp, start);
  const left = () => Math.max(0, deadline - lp.now());
  let best: Best | null = start ? { bins: start, how: 'first-fit decreasing', repaired: false } : null;
  const objective = () => (best ? binsObjective(p, best.bins) : Infinity);
  const offer = (bins: Bin[] | null, how: string) => {
    if (!bins) return;
    const s = settleBins(p, bins);
    if (s.unplaced.length === 0 && binsObjective(p, s.bins) < objective() - 1e-9) best = { bins: s.bins, how, repaired: s.repaired > 0 };
  };
  try {
    const root = master.converge(lp.now() + left() * SHARE.root);
    const bound = root?.bound ?? null;
    const target = bound !== null ? roundUpBound(bound, p.step) : -Infinity;
    if (objective() > target + 1e-9) offer(dive(p, master, lp.now() + left() * SHARE.dive, objective()), 'column generation + diving');
    if (objective() > target + 1e-9 && left() > 50) {
      master.restore();
      if (best) master.include(best.bins);
      offer(master.mip(left() / 1000, best?.bins ?? null), 'column generation + MIP');
    }
    const found: Best | null = best;
    return { bins: found?.bins ?? null, lowerBound: bound, proved: false, repaired: found?.repaired ?? false, method: found?.how ?? 'column generation' };
  } finally {
    master.dispose();
  }
}

/** The LP bound alone (for a plan already known to meet the length bound). */
export function patternLpBound(p: CuttingProblem, lp: LpSolver, deadline: number, start: Bin[] | null): number | null {
  const master = new PatternMaster(p, lp, start);
  try {
    return master.converge(deadline)?.bound ?? null;
  } finally {
    master.dispose();
  }
}
