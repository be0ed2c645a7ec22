import { loadRulesDataFast } from '../rules-data-snapshot.ts';
import { loadLpSolver } from '../load-lp-solver.ts';
import { pointChecker } from '../../core/sweep/point-checker.ts';
import type { PointCheck, PointOutcome } from '../../core/sweep/point-outcome.ts';
import type { SweepPoint } from '../../core/sweep/sweep-points.ts';
import { bisectEdge, type Edge, type EdgeJob } from '../../core/sweep/envelope.ts';
import type { KeyPath } from '../../core/spec/input-issue.ts';

// The work of one thread of a sweep: the checker of points built once from
// the spec, then points and envelope edges as they are handed over. The same
// code runs in a worker thread and, for one job, in the command's own thread.

export interface SweepSetup {
  raw: unknown;
  rulesDir: string;
  paths: KeyPath[];
  ride: boolean;
  figures: string[];
}

export type WorkRequest = { kind: 'points'; points: SweepPoint[] } | { kind: 'edge'; job: EdgeJob; resolution: number; design: number[] };
export type WorkReply = { outcomes: PointOutcome[] } | { edge: Edge };

export interface Ready {
  /** Every figure the check of this spec names, with its unit where it has a value at the design point. */
  figureUnits: Record<string, string>;
  design: PointCheck;
}

export type SweepWork = { ok: true; ready: Ready; handle(req: WorkRequest): WorkReply } | { ok: false; reason: string };

export async function startSweepWork(setup: SweepSetup): Promise<SweepWork> {
  const data = loadRulesDataFast(setup.rulesDir);
  const checker = pointChecker(setup.raw, data, setup.paths, { lp: await loadLpSolver(), ride: setup.ride, figures: setup.figures });
  if (!checker.ok) return checker;
  // A point whose check throws outside the rules is a point with its reason, not the end of the sweep.
  const check = (values: readonly number[]): PointCheck => {
    try {
      return checker.check(values);
    } catch (e) {
      const reason = `the check stopped: ${(e instanceof Error ? e.message : String(e)).split('\n')[0]}`;
      return { verdict: 'error', worst_utilisation: null, worst: null, figures: setup.figures.map(() => null), reason };
    }
  };
  return {
    ok: true,
    ready: { figureUnits: checker.figureUnits, design: checker.design },
    handle(req) {
      if (req.kind === 'points') return { outcomes: req.points.map((p) => ({ index: p.index, values: p.values, ...(p.line === undefined ? {} : { line: p.line }), ...(p.design ? { design: true } : {}), ...check(p.values) })) };
      const at = (v: number) => req.design.map((d, i) => (i === req.job.axis ? v : d));
      return { edge: bisectEdge(req.job, req.resolution, (v) => check(at(v))) };
    },
  };
}
