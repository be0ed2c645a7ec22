import { param } from '../../data/param.ts';
import type { RulesData } from '../../data/rules-data.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { G } from '../../units/units.ts';
import type { FloorResult } from '../floor-result.ts';
import { partClearances, type PartClearance } from './clearance.ts';
import { floorNet, floorNodeCount, type FloorNet } from './floor-net.ts';
import { patchWeights } from './foot-patch.ts';
import { crewResults, describeSegment, railPulls, reactionSum, strapTensions, tensions, type Loaded, type StrapTension } from './floor-results.ts';
import { solveNet, type NetSolution, type SolveSettings } from './solve-net.ts';

// The strap floor under the crew, loaded by their weight times a case factor
// (mechanics note, section 5). Only the crew stand on the straps; the siding
// and loads are carried by the frame, and the straps' own weight is left out.

export interface CaseFactor {
  value: number;
  source: string;
}

/** The floor result with what the rules show in their working. */
export interface FloorModel extends FloorResult {
  weave: CheckedSpecification['floor_straps']['weave'];
  EA_N: number;
  pretension_N: number;
  nodes: number;
  segments: number;
  /** The floor's sag over the pole and the axle beneath it. */
  clearances: PartClearance[];
  /** Each strap's largest tension (empty where the net was not solved). */
  straps: StrapTension[];
  /** Why the solver stopped short, when it did. */
  stopped?: string;
  /** Largest out-of-balance force before the first step and after each, N. */
  history: number[];
}

/** The solver's tolerance, step limit and node limit from rules/parameters/floor.yaml, for this applied load. */
export function floorSolveSettings(data: RulesData, appliedLoad_N: number): SolveSettings & { fraction: number; maxNodes: number } {
  const p = (name: string) => param(data, 'floor.solver', name).value;
  return { fraction: p('tolerance_fraction'), tolerance_N: p('tolerance_fraction') * appliedLoad_N, maxIterations: p('max_iterations'), maxNodes: p('max_nodes') };
}

export function crewLoads(spec: CheckedSpecification, floor: FloorNet, factor: number): Loaded[] {
  const { length_mm, width_mm } = spec.box.floor.foot_patch;
  return spec.crew.map((c) => {
    const patch = { x: c.x_mm, y: c.y_mm, length: length_mm, width: width_mm };
    return { role: c.role, load_N: c.mass_kg * G * factor, patch, weights: patchWeights(floor.net, patch) };
  });
}

export function nodalLoads(floor: FloorNet, crew: readonly Loaded[]): Float64Array {
  const P = new Float64Array(floor.net.nodes.length);
  for (const c of crew) for (const { node, w } of c.weights) P[node] += w * c.load_N;
  return P;
}

export function floorModel(spec: CheckedSpecification, data: RulesData, factor: CaseFactor, refine = 1): FloorModel {
  const s = spec.floor_straps;
  const appliedLoad_N = spec.crew.reduce((sum, c) => sum + c.mass_kg * G * factor.value, 0);
  const settings = floorSolveSettings(data, appliedLoad_N);
  const EA_N = data.leathers[s.material].modulus_MPa.value * s.width_mm * s.thickness_mm;
  const head = { factor: factor.value, factorSource: factor.source, tolerance_N: settings.tolerance_N, appliedLoad_N, weave: s.weave, pretension_N: s.pretension_N, EA_N };
  const count = floorNodeCount(spec, refine);
  if (count > settings.maxNodes) return declined(spec, head, count, settings.maxNodes);
  const floor = floorNet(spec, data, refine);
  const crew = crewLoads(spec, floor, factor.value);
  const sol: NetSolution = solveNet(floor.net, nodalLoads(floor, crew), settings);
  const T = tensions(floor.net, sol.sag);
  let worst = 0;
  T.forEach((t, i) => (t > T[worst] ? (worst = i) : 0));
  const maxTension_N = T.length ? T[worst] : 0;
  return {
    ...head,
    converged: sol.converged,
    iterations: sol.iterations,
    residual_N: sol.residual_N,
    maxTension_N,
    maxTensionAt: T.length ? describeSegment(floor.net, worst) : 'no straps',
    maxStress_MPa: maxTension_N / (s.width_mm * s.thickness_mm),
    crew: crewResults(floor, sol.sag, crew),
    rails: railPulls(floor, sol.sag, T),
    reactionSum_N: reactionSum(floor.net, sol.sag, T),
    nodes: floor.net.nodes.length,
    segments: floor.net.segments.length,
    clearances: partClearances(spec, floor, sol.sag),
    straps: strapTensions(floor.net, T),
    history: sol.history,
    ...(sol.stopped ? { stopped: sol.stopped } : {}),
  };
}

/** A net too large to solve within the check's time: every result unknown (NaN), reported as not converged. */
function declined(spec: CheckedSpecification, head: Pick<FloorModel, 'factor' | 'factorSource' | 'tolerance_N' | 'appliedLoad_N' | 'weave' | 'pretension_N' | 'EA_N'>, count: number, maxNodes: number): FloorModel {
  return {
    ...head,
    converged: false,
    iterations: 0,
    residual_N: NaN,
    maxTension_N: NaN,
    maxTensionAt: 'not solved',
    maxStress_MPa: NaN,
    crew: spec.crew.map((c) => ({ role: c.role, load_N: c.mass_kg * G * head.factor, sag_mm: NaN, secantStiffness_N_per_mm: NaN, tangentStiffness_N_per_mm: NaN })),
    rails: [],
    reactionSum_N: NaN,
    nodes: count,
    segments: NaN,
    clearances: [],
    straps: [],
    history: [],
    stopped: `the net would have about ${count} nodes, more than the ${maxNodes} the solver takes (max_nodes)`,
  };
}
