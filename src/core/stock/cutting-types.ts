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

/** The HiGHS module instance (npm `highs`), loaded once at the edge and handed in. */
/**
 * The LP solver, loaded at the edge and handed in, with the clock its time
 * limits are read from (the core reads no clock of its own).
 */
export type LpSolver = import('highs').Highs & { now(): number };
