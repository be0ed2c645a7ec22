import { performance } from 'node:perf_hooks';
import { edgeJobs, resolutionOf, type Edge } from '../../core/sweep/envelope.ts';
import type { PointOutcome } from '../../core/sweep/point-outcome.ts';
import type { SweepDefinition } from '../../core/sweep/sweep-result.ts';
import type { SweepPoint } from '../../core/sweep/sweep-points.ts';
import type { Lane } from './sweep-pool.ts';

// Handing a sweep's points to its threads: contiguous runs of points (so a
// thread's reuse of models holds across a run), sized from the time the last
// run took so each takes about TARGET_MS whatever a point costs: short
// enough for Ctrl-C to be seen soon, long enough to keep the threads busy.

const TARGET_MS = 400;
const FIRST_RUN = 4;
const MAX_RUN = 500;

export interface RunHooks {
  stop?: AbortSignal;
  /** Called with the count of points finished after each run of points. */
  step?(done: number): void;
}

export async function runPoints(lanes: readonly Lane[], points: readonly SweepPoint[], hooks: RunHooks = {}): Promise<{ outcomes: PointOutcome[]; stopped: boolean }> {
  const outcomes: PointOutcome[] = [];
  let next = 0;
  let size = FIRST_RUN;
  await Promise.all(
    lanes.map(async (lane) => {
      while (next < points.length && !hooks.stop?.aborted) {
        const run = points.slice(next, next + size);
        next += run.length;
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
