import type { Finding, Severity } from '../findings/finding.ts';
import type { CuttingResult } from '../cutlist/cutting-result.ts';
import type { RideSummary } from './ride-summary.ts';
import type { Drawing } from '../drawings/drawing.ts';
import type { PlotData } from '../plots/plot-data.ts';

export interface Figure {
  value: number;
  unit: string;
}

export interface PartMass {
  part: string;
  /** rolling: stands on wheels and pole; yoke: rests on the horses; crew; load. */
  group: 'rolling' | 'yoke';
  mass_kg: number;
  x_mm: number;
  y_mm: number;
  z_mm: number;
  /** True where the specification gave a measured mass. */
  measured: boolean;
  /** How the mass was found, with numbers. */
  basis: string;
}

export interface LoadCaseResult {
  id: string;
  title: string;
  crew_position: 'as placed' | 'forward' | 'aft';
  accel_g: number;
  pole_load_N: number;
  yoke_load_N: number;
  per_horse_N: number;
  axle_load_N: number;
  working: string;
}

/** One load the models computed, for the Loads sheet: what carries it, in which case. */
export interface LoadEntry {
  /** Family of the model: balance, turn, floor, member, lashing. */
  group: string;
  /** What carries the load, e.g. "outer wheel", "pole at the root". */
  item: string;
  /** Load case, e.g. "static", "bump", "design turn". */
  case: string;
  quantity: string;
  value: number;
  unit: string;
}

export interface SpecEntry {
  path: string;
  value: unknown;
  unit: string;
  /** True where the value came from a default, not from the user. */
  defaulted: boolean;
  note?: string;
}

export interface CheckResult {
  tool: { name: string; version: string };
  spec_name: string;
  verdict: Severity;
  figures: Record<string, Figure>;
  findings: Finding[];
  mass: { parts: PartMass[]; rolling_mass_kg: number; yoke_mass_kg: number; total_mass_kg: number };
  balance: { cases: LoadCaseResult[] };
  /** Loads from every model, by part and case. */
  loads: LoadEntry[];
  /** Cut list, leather list, wheel setting-out and stock plan. */
  cutting: CuttingResult;
  /** Drawings of the build as SVG text: side elevation, plan of the turn, floor straps by tension. */
  drawings?: Drawing[];
  /** Plots as data (lines, limits, positions): load on each horse over crew position, lateral acceleration over speed in the planned turn. */
  plots?: PlotData[];
  /** The ride model's cases (results without the full series, plus thinned series to plot) and the floor-damping tuner; absent where the model was not run. */
  ride?: RideSummary;
  spec_as_checked: SpecEntry[];
  /** The specification as read, before conversion and defaults; the result workbook starts with it. */
  input?: unknown;
  /** Every source cited by a limit, material value or finding. */
  sources: string[];
  cautions: string[];
}
