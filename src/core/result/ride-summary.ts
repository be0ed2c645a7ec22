// The ride model's results as the check result carries them: each case
// without its full time series (the ride command writes that as CSV), with
// the series thinned for the plots in the workbook's report.

import type { DampingNeeded } from '../ride/damping-tuner.ts';
import { RIDE_CASES, type RideCase, type RideResult, type RideSeries } from '../ride/ride-types.ts';
import { roundSignificant } from '../numeric/round-significant.ts';

/** Samples kept per channel for the report's plots: about one per pixel column of a plot. */
export const PLOT_SAMPLES = 600;
/** Significant digits kept for plotting: far finer than a plot can show, and a short result.json. */
const PLOT_DIGITS = 5;

export type RideCaseSummary = Omit<RideResult, 'series'> & {
  /** Every k-th sample of the series (k in `plot_stride`), for drawing. */
  plot: RideSeries;
  plot_stride: number;
};

export interface RideSummary {
  cases: RideCaseSummary[];
  /**
   * The least floor damping ratio that meets the decay rule and keeps the crew
   * on the floor over rough ground; null where no damping does. Absent where
   * the tuner did not run: it runs only when the decay rule finds the motion
   * dies out too slowly.
   */
  floor_damping_ratio_needed?: number | null;
  /** The floor damping ratio the cases were run with, and where it came from. */
  floor_damping_ratio_used?: { value: number; source: string };
  /** How the tuner found the damping needed: bounds, tolerance, runs. */
  floor_damping_working?: string;
}

export function rideSummary(ride: Record<RideCase, RideResult>, needed: DampingNeeded | null, dampingUsed?: { value: number; source: string }): RideSummary {
  return {
    cases: RIDE_CASES.filter((c) => ride[c] !== undefined).map((c) => rideCaseSummary(ride[c])),
    ...(needed ? { floor_damping_ratio_needed: needed.ratio, floor_damping_working: needed.working } : {}),
    ...(dampingUsed ? { floor_damping_ratio_used: dampingUsed } : {}),
  };
}

export function rideCaseSummary(r: RideResult, samples = PLOT_SAMPLES): RideCaseSummary {
  const { series, ...rest } = r;
  // A run that kept only a plot's samples (RunSettings.plotPoints, at PLOT_SAMPLES) has taken the stride already.
  if (series.stride) return { ...rest, plot: strideSeries(series, 1), plot_stride: series.stride };
  const stride = Math.max(1, Math.ceil(series.t_s.length / samples));
  return { ...rest, plot: strideSeries(series, stride), plot_stride: stride };
}

/** Every k-th sample, and always the last, so the plot spans the whole run; values to PLOT_DIGITS significant digits. */
export function strideSeries(s: RideSeries, k: number): RideSeries {
  const keep = s.t_s.map((_, i) => i).filter((i) => i % k === 0 || i === s.t_s.length - 1);
  const round = (v: number) => roundSignificant(v, PLOT_DIGITS);
  return { t_s: keep.map((i) => s.t_s[i]), channels: s.channels.map((c) => ({ ...c, values: keep.map((i) => round(c.values[i])) })) };
}
