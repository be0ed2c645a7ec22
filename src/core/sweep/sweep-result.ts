import pkg from '../../../package.json' with { type: 'json' };
import { CAUTIONS } from '../cautions.ts';
import { envelopes, robustRanges, type AxisEnvelope, type Edge, type RobustRange } from './envelope.ts';
import type { PointOutcome } from './point-outcome.ts';
import type { SweepAxis } from './sweep-axis.ts';
import type { SweepMode } from './sweep-points.ts';

// A sweep's results as the outputs carry them (sweep.json). Nothing here
// depends on how the points were shared out (threads, shards) or on the
// clock, so a sweep run whole and one run in shards and merged are the same.

export interface SweepDefinition {
  spec_name: string;
  /** The spec file's name as given (no folder). */
  spec_file: string;
  /** True for a statics-only sweep (the ride model off). */
  statics: boolean;
  mode: SweepMode;
  axes: SweepAxis[];
  /** The spec's own value of each varied value. */
  design: number[];
  figures: { name: string; unit: string }[];
  /** Every point of the run: the sweep, the envelope's lines and the design point. */
  total: number;
}

export interface SweepResult {
  tool: { name: string; version: string };
  kind: 'sweep';
  spec_name: string;
  spec_file: string;
  statics: boolean;
  mode: SweepMode;
  varied: { path: string; unit: string; from: number; to: number; count: number; design_value: number }[];
  figures: { name: string; unit: string }[];
  /** False where the run was stopped: the points are those finished, and no envelope is given. */
  complete: boolean;
  design: PointOutcome | null;
  points: PointOutcome[];
  envelope: AxisEnvelope[] | null;
  robust: RobustRange[] | null;
  /** Why the envelope or the robust ranges are not given, where they are not. */
  notes: string[];
  cautions: string[];
}

export function sweepCautions(def: Pick<SweepDefinition, 'statics' | 'mode'>): string[] {
  return [
    ...CAUTIONS,
    'Each point is a separate check of the specification with the varied values changed. Nothing between the points is checked: a narrow band that fails between two neighbouring values can be missed.',
    'The envelope holds the other varied values at the design point; the robust range holds only for the grid values of the others. Neither is a margin of safety: build at a value well inside them.',
    ...(def.statics ? ['Statics only (--statics): the ride model was not run, so the dynamic factors are the data\'s bounds, not the ride model\'s; the verdicts are provisional and may differ from `check`.'] : []),
    ...(def.mode.kind === 'samples' ? [`A Latin hypercube of ${def.mode.samples} points drawn with seed ${def.mode.seed}: the points are spread, not a grid.`] : []),
  ];
}

/** The result from the finished outcomes (any order) and, for a complete run, the envelope's edges. */
export function sweepResult(def: SweepDefinition, outcomes: readonly PointOutcome[], edges: readonly Edge[] | null): SweepResult {
  const sorted = [...outcomes].sort((a, b) => a.index - b.index);
  const complete = sorted.length === def.total && edges !== null;
  const notes: string[] = [];
  if (!complete) notes.push(`The run was stopped after ${sorted.filter((o) => o.line === undefined && !o.design).length} of the sweep's points: no envelope or robust range is given.`);
  const robust = complete ? robustRanges(def.axes, def.mode, sorted) : null;
  if (complete && !robust) notes.push(def.mode.kind === 'samples' ? 'Robust ranges need a grid: a Latin hypercube gives none.' : 'Robust ranges need two or three varied values.');
  return {
    tool: { name: pkg.name, version: pkg.version },
    kind: 'sweep',
    spec_name: def.spec_name,
    spec_file: def.spec_file,
    statics: def.statics,
    mode: def.mode,
    varied: def.axes.map((a, i) => ({ path: a.path, unit: a.unit, from: a.from, to: a.to, count: a.count, design_value: def.design[i] })),
    figures: def.figures,
    complete,
    design: sorted.find((o) => o.design) ?? null,
    points: sorted.filter((o) => o.line === undefined && !o.design),
    envelope: complete ? envelopes(def.axes, def.design, sorted, edges) : null,
    robust,
    notes,
    cautions: sweepCautions(def),
  };
}
