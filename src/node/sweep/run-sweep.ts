import { performance } from 'node:perf_hooks';
import { edgeJobs, resolutionOf, type Edge } from '../../core/sweep/envelope.ts';
import type { PointOutcome } from '../../core/sweep/point-outcome.ts';
import type { SweepDefinition } from '../../core/sweep/sweep-result.ts';
import type { SweepPoint } from '../../core/sweep/sweep-points.ts';
import type { Lane } from './sweep-pool.ts';

// Handing a sweep's points to its threads. The points go in the order of
// their values (the first varied value slowest), so an envelope line's point
// sits beside the grid's points of the same value and a model that reads
// only the first value is computed once per value of it. Each thread starts
// on a contiguous share of that order and, when it runs out, takes the back
// half of the largest share left; it takes its share in runs sized from the
// time the last run took, about TARGET_MS each: short enough for Ctrl-C to be
// seen soon, long enough to keep the threads busy.

const TARGET_MS = 400;
const FIRST_RUN = 4;
const MAX_RUN = 500;

export interface RunHooks {
  stop?: AbortSignal;
  /** Called with the count of points finished after each run of points. */
  step?(done: number): void;
}

/** The points in the order of their values, first value slowest. */
export function workOrder(points: readonly SweepPoint[]): SweepPoint[] {
  return [...points].sort((a, b) => {
    for (let i = 0; i < a.values.length; i++) if (a.values[i] !== b.values[i]) return a.values[i] - b.values[i];
    return a.index - b.index;
  });
}

export async function runPoints(lanes: readonly Lane[], points: readonly SweepPoint[], hooks: RunHooks = {}): Promise<{ outcomes: PointOutcome[]; stopped: boolean }> {
  const order = workOrder(points);
  const outcomes: PointOutcome[] = [];
  const shares = lanes.map((_, i) => ({ next: Math.floor((i * order.length) / lanes.length), end: Math.floor(((i + 1) * order.length) / lanes.length) }));
  let size = FIRST_RUN;
  const take = (own: { next: number; end: number }): SweepPoint[] => {
    if (own.next >= own.end) {
      const largest = shares.reduce((a, b) => (b.end - b.next > a.end - a.next ? b : a));
      const left = largest.end - largest.next;
      if (left <= 1) return left === 1 ? order.slice(largest.next, ++largest.next) : [];
      own.next = largest.next + Math.ceil(left / 2);
      own.end = largest.end;
      largest.end = own.next;
    }
    const run = order.slice(own.next, Math.min(own.end, own.next + size));
    own.next += run.length;
    return run;
  };
  await Promise.all(
    lanes.map(async (lane, i) => {
      for (let run = take(shares[i]); run.length && !hooks.stop?.aborted; run = take(shares[i])) {
        const started = performance.now();
        const reply = await lane.request({ kind: 'points', points: run });
        if (!('outcomes' in reply)) throw new Error('a sweep thread answered points with something else');
        const took = Math.max(1, performance.now() - started);
        size = Math.max(1, Math.min(MAX_RUN, Math.round((run.length * TARGET_MS) / took)));
        outcomes.push(...reply.outcomes);
        hooks.step?.(outcomes.length);
      }
    }),
  );
  return { outcomes, stopped: outcomes.length < points.length };
}

/** The envelope's edges, each bisected on a thread of its own; null where the run is stopped first. */
export async function runEdges(lanes: readonly Lane[], def: SweepDefinition, outcomes: readonly PointOutcome[], hooks: RunHooks = {}): Promise<Edge[] | null> {
  const jobs = edgeJobs(def.axes, outcomes);
  const edges: Edge[] = new Array<Edge>(jobs.length);
  let next = 0;
  let done = 0;
  await Promise.all(
    lanes.map(async (lane) => {
      while (next < jobs.length && !hooks.stop?.aborted) {
        const i = next++;
        const job = jobs[i];
        const reply = await lane.request({ kind: 'edge', job, resolution: resolutionOf(def.axes[job.axis]), design: def.design });
        if (!('edge' in reply)) throw new Error('a sweep thread answered an edge with something else');
        edges[i] = reply.edge;
        hooks.step?.(++done);
      }
    }),
  );
  return done === jobs.length ? edges : null;
}

export const edgeCount = (def: SweepDefinition, outcomes: readonly PointOutcome[]): number => edgeJobs(def.axes, outcomes).length;
