import { axisValues, type SweepAxis } from './sweep-axis.ts';
import { passes, type PointCheck, type PointOutcome } from './point-outcome.ts';
import type { SweepMode } from './sweep-points.ts';

// The feasible envelope of each varied value: along its line through the
// design point (the others held at the spec's own values), the intervals
// whose points pass (a verdict short of fail), each edge between a passing
// and a failing value of the line found by bisection on the whole check to
// the sweep's resolution. With two or three varied values, the robust range
// of each: its grid values at which every grid value of the others passes.

/** The sweep's resolution: an edge is bisected until it is known to this fraction of its value's range. */
export const RESOLUTION_PARTS = 1000;

export const resolutionOf = (axis: SweepAxis): number => (axis.to - axis.from) / RESOLUTION_PARTS;

/** An edge to find: between a passing and a failing value of one line. */
export interface EdgeJob {
  axis: number;
  pass: number;
  fail: number;
  /** The failing end's check, kept as the edge's reason when bisection finds none nearer. */
  failCheck: PointCheck;
}

export interface Edge {
  /** The last value known to pass, and the first known not to, at most the resolution apart. */
  pass: number;
  fail: number;
  /** What the check gives just beyond: the verdict and the finding of highest utilisation, or the refusal. */
  beyond: PointCheck;
  /** Checks the bisection made. */
  checks: number;
}

/** One interval of passing values; an end that is the end of the swept range has no edge (it may pass further on). */
export interface PassInterval {
  low: number;
  high: number;
  low_edge: Edge | null;
  high_edge: Edge | null;
}

export interface AxisEnvelope {
  path: string;
  unit: string;
  resolution: number;
  design_value: number;
  intervals: PassInterval[];
}

export interface RobustRange {
  path: string;
  unit: string;
  /** Runs of grid values at which every grid value of the others passes; none where no value does. */
  intervals: { low: number; high: number }[];
}

/** Bisect between a passing and a failing value until they are no more than `resolution` apart. */
export function bisectEdge(job: EdgeJob, resolution: number, check: (v: number) => PointCheck): Edge {
  let { pass, fail } = job;
  let beyond = job.failCheck;
  let checks = 0;
  while (Math.abs(fail - pass) > resolution) {
    const mid = (pass + fail) / 2;
    const r = check(mid);
    checks++;
    if (passes(r.verdict)) pass = mid;
    else {
      fail = mid;
      beyond = r;
    }
  }
  return { pass, fail, beyond, checks };
}

/** The line's outcomes of one varied value, in rising value. */
const lineOf = (outcomes: readonly PointOutcome[], axis: number) => outcomes.filter((o) => o.line === axis).sort((a, b) => a.values[axis] - b.values[axis]);

/** Every edge of every line: each pair of neighbouring values where one passes and the other does not. */
export function edgeJobs(axes: readonly SweepAxis[], outcomes: readonly PointOutcome[]): EdgeJob[] {
  const jobs: EdgeJob[] = [];
  axes.forEach((_, axis) => {
    const line = lineOf(outcomes, axis);
    for (let k = 1; k < line.length; k++) {
      const [a, b] = [line[k - 1], line[k]];
      if (passes(a.verdict) === passes(b.verdict)) continue;
      const [p, f] = passes(a.verdict) ? [a, b] : [b, a];
      jobs.push({ axis, pass: p.values[axis], fail: f.values[axis], failCheck: stripIdentity(f) });
    }
  });
  return jobs;
}

const stripIdentity = (o: PointOutcome): PointCheck => ({ verdict: o.verdict, worst_utilisation: o.worst_utilisation, worst: o.worst, figures: o.figures, ...(o.reason === undefined ? {} : { reason: o.reason }) });

/** The envelope of each varied value from its line and its edges (in edgeJobs' order). */
export function envelopes(axes: readonly SweepAxis[], design: readonly number[], outcomes: readonly PointOutcome[], edges: readonly Edge[]): AxisEnvelope[] {
  const jobs = edgeJobs(axes, outcomes);
  const edgeAt = (axis: number, a: number, b: number) => edges[jobs.findIndex((j) => j.axis === axis && Math.min(j.pass, j.fail) === a && Math.max(j.pass, j.fail) === b)] ?? null;
  return axes.map((ax, axis) => {
    const line = lineOf(outcomes, axis);
    const intervals: PassInterval[] = [];
    let open: PassInterval | null = null;
    line.forEach((o, k) => {
      const v = o.values[axis];
      if (passes(o.verdict)) {
        if (!open) {
          const e = k === 0 ? null : edgeAt(axis, line[k - 1].values[axis], v);
          open = { low: e ? e.pass : v, high: v, low_edge: e, high_edge: null };
          intervals.push(open);
        }
        open.high = v;
      } else if (open) {
        const e = edgeAt(axis, line[k - 1].values[axis], v);
        open.high_edge = e;
        if (e) open.high = e.pass;
        open = null;
      }
    });
    return { path: ax.path, unit: ax.unit, resolution: resolutionOf(ax), design_value: design[axis], intervals };
  });
}

/** Robust ranges: on a grid of two or three values only; null otherwise. */
export function robustRanges(axes: readonly SweepAxis[], mode: SweepMode, outcomes: readonly PointOutcome[]): RobustRange[] | null {
  if (mode.kind !== 'grid' || axes.length < 2) return null;
  const own = outcomes.filter((o) => o.line === undefined && !o.design);
  const strides = axes.map((_, i) => axes.slice(i + 1).reduce((n, a) => n * a.count, 1));
  return axes.map((ax, axis) => {
    const ok = new Array<boolean>(ax.count).fill(true);
    for (const o of own) if (!passes(o.verdict)) ok[Math.floor(o.index / strides[axis]) % ax.count] = false;
    const values = axisValues(ax);
    const intervals: { low: number; high: number }[] = [];
    ok.forEach((good, k) => {
      if (!good) return;
      const last = intervals.at(-1);
      if (last && ok[k - 1]) last.high = values[k];
      else intervals.push({ low: values[k], high: values[k] });
    });
    return { path: ax.path, unit: ax.unit, intervals };
  });
}
