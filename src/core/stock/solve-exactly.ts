import { arcFlowGraph } from './arc-flow-graph.ts';
import { arcFlow } from './arc-flow.ts';
import { binsObjective, type Bin } from './bin.ts';
import { columnGeneration } from './column-generation.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { LpSolver } from './cutting-types.ts';
import { roundUpBound } from './objective-step.ts';
import type { SolverOutcome } from './solver-outcome.ts';
import type { WorkMeter } from './work-meter.ts';

export type ExactMethod = 'column generation' | 'arc flow';

/**
 * Arc-flow graphs up to this many arcs are worth a proof attempt after column
 * generation; on the OR-Library sets (about 2000 to 3300 arcs) the arc-flow
 * MIP alone took seconds, so larger graphs are left alone.
 */
export const ARC_PROOF_MAX_ARCS = 1500;

/**
 * Column generation (the default) or the arc-flow MIP. A column-generation
 * plan that does not meet its rounded-up bound is proved or bettered by the
 * arc-flow MIP, started from it, where the graph is small and the meter has work left.
 */
export function solveExactly(p: CuttingProblem, lp: LpSolver, method: ExactMethod, meter: WorkMeter, start: Bin[] | null): SolverOutcome {
  if (method === 'arc flow') return arcFlow(p, lp, meter, start);
  const cg = columnGeneration(p, lp, meter, start);
  const objective = cg.bins ? binsObjective(p, cg.bins) : Infinity;
  if (cg.lowerBound !== null && objective <= roundUpBound(cg.lowerBound, p.step) + 1e-9) return cg;
  if (meter.exhausted('mipNodes')) return cg;
  const g = arcFlowGraph(p);
  if (g.arcs.length > ARC_PROOF_MAX_ARCS) return cg;
  const af = arcFlow(p, lp, meter, cg.bins ?? start, g);
  const lowerBound = Math.max(cg.lowerBound ?? -Infinity, af.lowerBound ?? -Infinity);
  const bound = Number.isFinite(lowerBound) ? lowerBound : null;
  if (af.bins && binsObjective(p, af.bins) < objective - 1e-9) return { ...af, lowerBound: bound, method: `${cg.method}, bettered by arc flow MIP` };
  return { ...cg, lowerBound: bound, proved: af.proved && af.bins !== null && binsObjective(p, af.bins) >= objective - 1e-9, method: af.proved ? `${cg.method}, proved by arc flow MIP` : cg.method };
}
