import type { Bin } from './bin.ts';

/** What an exact method hands back before the bins are settled into a plan. */
export interface SolverOutcome {
  /** Settled bins (every piece cut exactly its quantity); null when the solver found none in time. */
  bins: Bin[] | null;
  /** A proved lower bound on the objective (on the grid), or null. */
  lowerBound: number | null;
  /** The MIP proved its solution optimal for the whole problem. */
  proved: boolean;
  /** First-fit decreasing had to cut pieces the solver's solution left out. */
  repaired: boolean;
  method: string;
}
