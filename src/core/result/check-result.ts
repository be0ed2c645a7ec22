import type { CitedSource } from '../sources.ts';
import type { Figure } from './figure.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { LoadEntry } from '../loads/load-entry.ts';
import type { LoadCaseResult } from '../model/load-case-result.ts';
import type { PartMass } from '../model/part-mass.ts';
import type { Choices } from '../data/choices.ts';
import type { Finding, Severity } from '../findings/finding.ts';
import type { CuttingResult } from '../cutlist/cutting-result.ts';
import type { RideSummary } from './ride-summary.ts';
import type { BuildScene } from './build-scene.ts';
import type { PlotData } from '../plots/plot-data.ts';
import type { DecisiveInput, DecisiveSearch } from '../decisive/decisive-input.ts';

export interface CheckResult {
  tool: { name: string; version: string };
  spec_name: string;
  verdict: Severity;
  /** Why the verdict is provisional (it rests on a bound, not a model's result); empty where it is not. */
  provisional: string[];
  /** What each severity means, one line each. */
  severity_meanings: Record<Severity, string>;
  /** Named figures, each a finite number: never NaN, Infinity or null. */
  figures: Record<string, Figure>;
  /** The figures that do not apply to this build or run, each with the reason, in words. */
  figures_not_applicable: Record<string, string>;
  findings: Finding[];
  /** The guesses and remembered data values each decisive finding hangs on, with break-even values; absent where the search was not asked for. */
  decisive_inputs?: DecisiveInput[];
  /** What the search for decisive inputs did (findings, candidates, re-runs, the work limit). */
  decisive_search?: DecisiveSearch;
  mass: { parts: PartMass[]; rolling_mass_kg: number; yoke_mass_kg: number; total_mass_kg: number };
  balance: { cases: LoadCaseResult[] };
  /** Loads from every model, by part and case. */
  loads: LoadEntry[];
  /** Cut list, leather list, wheel setting-out and stock plan. */
  cutting: CuttingResult;
  /** What the drawings of the build (side elevation, plan of the turn, floor straps by tension) are made from. */
  scene: BuildScene;
  /** Plots as data (lines, limits, positions): load on each horse over crew position, lateral acceleration over speed in the planned turn. */
  plots?: PlotData[];
  /** The ride model's cases (results without the full series, plus thinned series to plot) and the floor-damping tuner; absent where the model was not run. */
  ride?: RideSummary;
  spec_as_checked: SpecEntry[];
  /** The species, materials and grounds the rules data offered (the result workbook's drop-down lists). */
  choices: Choices;
  /** The specification as read, before conversion and defaults; the result workbook starts with it. */
  input?: unknown;
  /** Every source cited by a limit, material value or finding, with its catalogue entry. */
  sources: CitedSource[];
  cautions: string[];
}
