// One-dimensional cutting stock: the plain instance that `axletree stock`
// reads, and the plan the planner returns. Lengths in mm.

export interface StockLength {
  length_mm: number;
  /** Price of one piece; where no stock has a price, the plan minimises the count of pieces. */
  cost?: number;
  /** How many pieces can be had; unlimited where absent. */
  available?: number;
}

export interface PieceDemand {
  length_mm: number;
  quantity: number;
  label?: string;
}

export interface CuttingInstance {
  kerf_mm: number;
  stock: StockLength[];
  pieces: PieceDemand[];
}

export interface CuttingPattern {
  stock_length_mm: number;
  /** How many stock pieces are cut to this pattern. */
  count: number;
  /** The pieces in cutting order. */
  cuts: { label: string; length_mm: number }[];
  /** Length left after the cuts and their kerfs. */
  offcut_mm: number;
}

export interface CuttingPlan {
  /** Stock pieces cut. */
  pieces_used: number;
  /** Total cost, where costs are given; else null. */
  cost: number | null;
  /** The LP relaxation's bound: in cost where costs are given, else in stock pieces. */
  lower_bound: number;
  /** True when the plan is proven optimal (its objective meets the rounded-up bound, or the MIP proved it). */
  optimal: boolean;
  /** (objective − bound) / bound. */
  gap: number;
  /**
   * The LP relaxation's optimum (the Gilmore-Gomory pattern LP, or the arc-flow
   * LP), in the objective's units; null where no LP was solved (no solver,
   * lengths off the grid, a solver failure). Where the work limit stopped
   * pricing before the LP converged, Farley's bound from the last duals.
   */
  lp_value: number | null;
  /** lp_value rounded up to the objective's step (whole stock pieces by count): no plan does better. */
  lp_bound: number | null;
  /** The plan's objective less lp_bound: stock pieces (or cost) above the LP bound; 0 at the bound. */
  lp_gap: number | null;
  patterns: CuttingPattern[];
  /** Stock bought, by length. */
  bought: { length_mm: number; count: number; cost: number | null }[];
  waste_mm: number;
  waste_pct: number;
  /** Which method gave the plan, e.g. "column generation + MIP", "first-fit decreasing". */
  method: string;
  /** The first-fit decreasing baseline, for comparison. */
  baseline: { pieces_used: number; cost: number | null };
}

/**
 * The LP solver (the HiGHS module of npm `highs`), loaded once at the edge and
 * handed in. The planner's limits are counted in work (work-meter.ts), so it
 * needs no clock.
 */
export type LpSolver = import('highs').Highs;
