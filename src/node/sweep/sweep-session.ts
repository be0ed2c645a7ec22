import type { Progress } from '../progress.ts';
import type { PointOutcome } from '../../core/sweep/point-outcome.ts';
import { sweepResult, type SweepDefinition, type SweepResult } from '../../core/sweep/sweep-result.ts';
import type { SweepPoint } from '../../core/sweep/sweep-points.ts';
import type { Lane } from './sweep-pool.ts';
import { edgeCount, runEdges, runPoints } from './run-sweep.ts';

// A sweep's long part, on threads already started: the points, then (for a
// whole sweep that was not stopped) the envelope's edges, each with its
// progress bar. Stopped, it keeps what is finished.

export interface SessionHooks {
  stop?: AbortSignal;
  progress(label: string, total: number): Progress;
}

export async function checkPoints(lanes: readonly Lane[], points: readonly SweepPoint[], hooks: SessionHooks): Promise<{ outcomes: PointOutcome[]; stopped: boolean }> {
  const bar = hooks.progress('sweep', points.length);
  const run = await runPoints(lanes, points, { stop: hooks.stop, step: (d) => bar.step(d) });
  bar.finish(run.outcomes.length, run.stopped);
  return run;
}

/** The whole sweep's result from every point's outcome: the edges found unless the run is stopped. */
export async function finishSweep(lanes: readonly Lane[], def: SweepDefinition, outcomes: readonly PointOutcome[], hooks: SessionHooks): Promise<{ result: SweepResult; stopped: boolean }> {
  if (outcomes.length < def.total) return { result: sweepResult(def, outcomes, null), stopped: true };
  const bar = hooks.progress('envelope', edgeCount(def, outcomes));
  const edges = await runEdges(lanes, def, outcomes, { stop: hooks.stop, step: (d) => bar.step(d) });
  bar.finish(edges?.length ?? 0, edges === null);
  return { result: sweepResult(def, outcomes, edges), stopped: edges === null };
}
