import { axisValue, MAX_POINTS, type Parsed, type SweepAxis } from './sweep-axis.ts';
import { seededRandom, shuffledIndices } from './seeded-random.ts';

// The points of a sweep, in a fixed order every shard and every run agrees
// on: first the sweep itself (a grid, the last value varying fastest, or a
// Latin hypercube drawn from its seed), then, for each varied value, its
// line through the design point (the others held at the spec's own values),
// which the feasible envelope is found from; last, the design point itself.

export type SweepMode = { kind: 'grid' } | { kind: 'samples'; samples: number; seed: number };

export interface SweepPlan {
  axes: SweepAxis[];
  mode: SweepMode;
  /** The spec's own value of each varied value: the design point. */
  design: number[];
}

export interface SweepPoint {
  index: number;
  values: number[];
  /** On the envelope's line of this varied value (its index), the others at the design point; absent on the sweep itself. */
  line?: number;
  /** The design point itself (the spec as given), last in the list. */
  design?: true;
}

/** The count of points of the sweep itself (without the envelope's lines). */
export function sweepSize(axes: readonly SweepAxis[], mode: SweepMode): number {
  return mode.kind === 'samples' ? mode.samples : axes.reduce((n, a) => n * a.count, 1);
}

/** The plan's size within MAX_POINTS, or why not. */
export function checkSize(axes: readonly SweepAxis[], mode: SweepMode): Parsed<number> {
  const n = sweepSize(axes, mode);
  if (n > MAX_POINTS) return { ok: false, message: `the sweep has ${n} points; at most ${MAX_POINTS} are run in one sweep (fewer values per --vary, or --samples)` };
  return { ok: true, value: n };
}

export function gridPoints(axes: readonly SweepAxis[]): number[][] {
  let rows: number[][] = [[]];
  for (const a of axes) rows = rows.flatMap((r) => Array.from({ length: a.count }, (_, i) => [...r, axisValue(a, i)]));
  return rows;
}

/** n points, each value's range cut into n equal strata and each stratum used once, at a random place inside it. */
export function latinHypercube(axes: readonly SweepAxis[], n: number, seed: number): number[][] {
  const random = seededRandom(seed);
  const columns = axes.map((a) => {
    const order = shuffledIndices(n, random);
    return order.map((stratum) => a.from + ((a.to - a.from) * (stratum + random())) / n);
  });
  return Array.from({ length: n }, (_, i) => columns.map((c) => c[i]));
}

export function sweepPoints(plan: SweepPlan): SweepPoint[] {
  const { axes, mode, design } = plan;
  const own = mode.kind === 'grid' ? gridPoints(axes) : latinHypercube(axes, mode.samples, mode.seed);
  const points: SweepPoint[] = own.map((values, index) => ({ index, values }));
  axes.forEach((a, line) => {
    for (let k = 0; k < a.count; k++) {
      const values = design.map((d, j) => (j === line ? axisValue(a, k) : d));
      points.push({ index: points.length, values, line });
    }
  });
  points.push({ index: points.length, values: [...design], design: true });
  return points;
}

/** The i-th (1-based) of n contiguous slices of a list of `total` items: every item in exactly one slice. */
export function shardRange(total: number, i: number, n: number): { start: number; end: number } {
  return { start: Math.floor(((i - 1) * total) / n), end: Math.floor((i * total) / n) };
}
