import { param } from '../../data/param.ts';
import type { RulesData } from '../../data/rules-data.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { G } from '../../units/units.ts';
import type { FloorResult } from '../floor-result.ts';
import { partClearances, type PartClearance } from './clearance.ts';
import { floorLines, floorNet, floorNodeCount, type FloorNet } from './floor-net.ts';
import { patchWeights } from './foot-patch.ts';
import { crewResults, describeSegment, reactionSum, strapPulls, strapTensions, tensions, type Loaded, type StrapTension } from './floor-results.ts';
import { SLACK_TENSION, solveNet } from './solve-net.ts';
import type { SolveSettings } from './solve-net.ts';
import { coupledTangent, solveCoupled, strapSpans, type CoupledSolution } from './coupled-solve.ts';
import { SkylineCholesky } from './skyline.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { segmentState } from './segment.ts';
import type { CableNet } from './net.ts';
import { FloorFrame, type FrameState } from '../floor-frame/frame-model.ts';
import { ARC_STEP_DEG, frameOfFloor, type FrameBasis } from '../floor-frame/frame-of-floor.ts';
import type { FloorFrameResult } from '../floor-frame/frame-result.ts';

// The strap floor under the crew, loaded by their weight times a case factor
// (mechanics note, section 5). Only the crew stand on the straps; the siding
// and loads are carried by the frame, and the straps' own weight is left out.
// The net is solved together with its frame bending in plan (coupled-solve.ts,
// floor-frame/): the anchors move in as the rails bow and the straps slacken.
// `anchors: 'fixed'` solves it on rigid anchors instead, for comparison.

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
  /** The frame under this case's strap pulls; null where the net was not solved. */
  frame: FloorFrameResult | null;
}

export interface FloorOptions {
  refine?: number;
  anchors?: 'coupled' | 'fixed';
  arcStepDeg?: number;
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

export function floorModel(spec: CheckedSpecification, data: RulesData, factor: CaseFactor, options: FloorOptions = {}): FloorModel {
  const { refine = 1, anchors = 'coupled', arcStepDeg = ARC_STEP_DEG } = options;
  const s = spec.floor_straps;
  const appliedLoad_N = spec.crew.reduce((sum, c) => sum + c.mass_kg * G * factor.value, 0);
  const settings = floorSolveSettings(data, appliedLoad_N);
  const EA_N = data.leathers[s.material].modulus_MPa.value * s.width_mm * s.thickness_mm;
  const head = { factor: factor.value, factorSource: factor.source, tolerance_N: settings.tolerance_N, appliedLoad_N, weave: s.weave, pretension_N: s.pretension_N, EA_N };
  // The lines are cheap to lay; their exact node count decides before the net is built and solved.
  const laid = floorLines(spec, data, refine);
  const count = floorNodeCount(laid.lines);
  if (count > settings.maxNodes) return declined(spec, head, count, settings.maxNodes);
  const floor = floorNet(spec, data, refine, laid);
  const basis = frameOfFloor(spec, data, floor, arcStepDeg);
  const frame = new FloorFrame(basis.input);
  const F = anchors === 'fixed' ? new Float64Array(floor.net.straps.length ** 2) : frame.flexibility();
  const crew = crewLoads(spec, floor, factor.value);
  const loads = nodalLoads(floor, crew);
  // The pretension alone: the same net and frame with no one aboard; its pulls and the sags on rigid anchors start the loaded solve.
  const rest = solveCoupled(floor.net, new Float64Array(floor.net.nodes.length), F, settings);
  const sol = solveCoupled(floor.net, loads, F, settings, { sag: solveNet(floor.net, loads, settings).sag, pulls: rest.pulls });
  const moved: FloorNet = { ...floor, net: withPlanLengths(floor.net, sol.flats) };
  const T = tensions(moved.net, sol.sag);
  let worst = 0;
  T.forEach((t, i) => (t > T[worst] ? (worst = i) : 0));
  const maxTension_N = T.length ? T[worst] : 0;
  const converged = sol.converged && rest.converged;
  const stopped = sol.stopped ?? (rest.converged ? undefined : `the pretension alone: ${rest.stopped}`);
  return {
    ...head,
    converged,
    iterations: sol.iterations,
    residual_N: Math.max(sol.residual_N, rest.residual_N),
    maxTension_N,
    maxTensionAt: T.length ? describeSegment(floor.net, worst) : 'no straps',
    maxStress_MPa: maxTension_N / (s.width_mm * s.thickness_mm),
    crew: crewResults(floor, sol.sag, crew, coupledCompliance(floor.net, sol, F)),
    rails: strapPulls(floor, sol.pulls),
    reactionSum_N: reactionSum(moved.net, sol.sag, T),
    nodes: floor.net.nodes.length,
    segments: floor.net.segments.length,
    clearances: partClearances(spec, floor, sol.sag),
    straps: strapTensions(moved.net, T),
    history: sol.history,
    frame: frameResult(basis, frame, anchors, frame.solve(sol.pulls), rest),
    ...(stopped ? { stopped } : {}),
  };
}

/** The net with its segments' plan lengths after the anchors moved. */
function withPlanLengths(net: CableNet, flats: ArrayLike<number>): CableNet {
  return { ...net, segments: net.segments.map((seg, i) => ({ ...seg, flat: flats[i] })) };
}

/** The coupled tangent's response to a unit load pattern: the sags it adds (frame included). */
function coupledCompliance(net: CableNet, sol: CoupledSolution, F: ArrayLike<number>): ((p: Float64Array) => Float64Array) | null {
  const states = net.segments.map((seg, i) => segmentState(seg, seg.a < 0 ? 0 : sol.sag[seg.a], seg.b < 0 ? 0 : sol.sag[seg.b], sol.flats[i]));
  const K = new SkylineCholesky(net.nodes.length, coupledPairs(net), nodeOrder(net));
  const spans = strapSpans(net);
  // Only a net without pretension can have a slack strap with no stiffness at all; give it the solver's stand-in.
  const T = coupledTangent(net, F, spans, states, K, 0, 0) ?? coupledTangent(net, F, spans, states, K, SLACK_TENSION, 0);
  if (!T) return null;
  const zero = new Float64Array(net.straps.length);
  return (p) => T.solve(p, zero)?.du ?? new Float64Array(p.length).fill(NaN);
}

function frameResult(basis: FrameBasis, frame: FloorFrame, anchors: 'coupled' | 'fixed', state: FrameState, rest: CoupledSolution): FloorFrameResult {
  const restState = frame.solve(rest.pulls);
  return {
    anchors,
    species: basis.species,
    E_MPa: basis.E_MPa,
    I_mm4: basis.I_mm4,
    A_mm2: basis.A_mm2,
    cornerRadius_mm: frame.loop.centreRadius,
    nodes: frame.loop.nodes.length,
    elements: frame.loop.elements.length,
    rails: state.rails,
    struts: state.struts.map((st, i) => ({ ...st, working: basis.struts[i].working })),
    unsupported: basis.unsupported,
    maxAnchorMove_mm: anchors === 'fixed' ? 0 : state.maxAnchorMove_mm,
    pretension: { rails: restState.rails, minPull_N: Math.min(...rest.pulls), maxPull_N: Math.max(...rest.pulls), maxAnchorMove_mm: anchors === 'fixed' ? 0 : restState.maxAnchorMove_mm },
    sources: basis.sources,
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
    frame: null,
    stopped: `the net would have ${count} nodes, more than the ${maxNodes} the solver takes (max_nodes)`,
  };
}
