import { param } from '../../data/param.ts';
import type { RulesData } from '../../data/rules-data.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { G } from '../../units/units.ts';
import type { CaseFactor, FloorModel, FloorStart } from './floor-state.ts';
import { partClearances } from './clearance.ts';
import { floorLines, floorNet, floorNodeCount, type FloorNet } from './floor-net.ts';
import { patchWeights } from './foot-patch.ts';
import { crewResults, describeSegment, reactionSum, strapPulls, strapTensions, tensions, type Loaded } from './floor-results.ts';
import { solveNet } from './solve-net.ts';
import type { SolveSettings } from './solve-net.ts';
import { solveCoupled, type CoupledSolution, type CoupledWorkspace } from './coupled-solve.ts';
import { coupledCompliance } from './coupled-compliance.ts';
import { couplingPreconditioner } from './coupled-tangent.ts';
import { declinedFloor, type FloorHead } from './floor-declined.ts';
import { SkylineCholesky } from './skyline.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { RestMemo } from './floor-rest.ts';
import { FloorFrame, type FrameState } from '../floor-frame/frame-model.ts';
import { ARC_STEP_DEG, frameOfFloor, type FrameBasis } from '../floor-frame/frame-of-floor.ts';
import type { FloorFrameResult } from '../floor-frame/frame-result.ts';

// The strap floor under the crew, loaded by their weight times a case factor
// (mechanics note, section 5). Only the crew stand on the straps; the siding
// and loads are carried by the frame, and the straps' own weight is left out.
// The net is solved together with its frame bending in plan (coupled-solve.ts,
// floor-frame/): the anchors move in as the rails bow and the straps slacken.
// `anchors: 'fixed'` solves it on rigid anchors instead, for comparison.

export type { CaseFactor, FloorModel } from './floor-state.ts';

export interface FloorOptions {
  refine?: number;
  anchors?: 'coupled' | 'fixed';
  arcStepDeg?: number;
  /**
   * False: each crew member's tangent stiffness is left unknown (NaN), saving a coupled solve per person and state.
   * Only the standing floor's is read (the ride model's spring, floor.stiffness), so the check's loaded states skip it.
   */
  crewTangent?: boolean;
  /**
   * A solved state to start the lightest state from, in place of the sags on rigid anchors: the loaded states start
   * from the standing floor, a decisive-input trial's standing floor from the check's. Taken only where it has as
   * many nodes and straps as this net (another make of strap or other dimensions may keep the shape). The answer is
   * the same to the solver's tolerance, reached in fewer steps where the load changed little.
   */
  start?: FloorStart;
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

/** One floor state: the crew's weight times `factor`. */
export function floorModel(spec: CheckedSpecification, data: RulesData, factor: CaseFactor, options: FloorOptions = {}, setup?: FloorSetup): FloorModel {
  return floorModels(spec, data, [factor], options, setup)[0];
}

/**
 * The net, its frame and the frame's flexibility at the anchors: what every
 * state of one floor shares, whoever stands on it (the crew's places and
 * weights are not read). Built once per check for the standing floor and the
 * four loaded states, and kept by a sweep or a workbench edit that moves only
 * the crew. Nothing in it changes once built (the frame's factor is made in
 * its constructor) but the kept pretension-alone solve (floor-rest.ts), which
 * reads no crew either; each solve makes its own matrix and workspace.
 */
export interface FloorSetup {
  /** The net's real node count, and the most the solver takes (rules/parameters/floor.yaml). */
  count: number;
  maxNodes: number;
  /** Absent where the net has more nodes than that: the floor is declined, not solved. */
  built?: { floor: FloorNet; basis: FrameBasis; frame: FloorFrame; F: Float64Array; pairs: [number, number][]; order: Int32Array; anchors: 'coupled' | 'fixed'; rest: RestMemo };
}

export function floorSetup(spec: CheckedSpecification, data: RulesData, options: FloorOptions = {}): FloorSetup {
  const { refine = 1, anchors = 'coupled', arcStepDeg = ARC_STEP_DEG } = options;
  // The lines are cheap to lay; their exact node count decides before the net is built and solved.
  const laid = floorLines(spec, data, refine);
  const count = floorNodeCount(laid.lines);
  const maxNodes = param(data, 'floor.solver', 'max_nodes').value;
  if (count > maxNodes) return { count, maxNodes };
  const floor = floorNet(spec, data, refine, laid);
  const basis = frameOfFloor(spec, data, floor, arcStepDeg);
  const frame = new FloorFrame(basis.input);
  const F = anchors === 'fixed' ? new Float64Array(floor.net.straps.length ** 2) : frame.flexibility();
  return { count, maxNodes, built: { floor, basis, frame, F, pairs: coupledPairs(floor.net), order: nodeOrder(floor.net), anchors, rest: new RestMemo() } };
}

/**
 * Several floor states of one specification in one go, in the order given:
 * the net, its frame and the pretension alone are built and solved once, and
 * the states are solved in rising load, each starting from the one below.
 */
export function floorModels(spec: CheckedSpecification, data: RulesData, factors: readonly CaseFactor[], options: FloorOptions = {}, setup?: FloorSetup): FloorModel[] {
  const s = spec.floor_straps;
  const EA_N = data.leathers[s.material].modulus_MPa.value * s.width_mm * s.thickness_mm;
  const heads = factors.map((factor) => {
    const appliedLoad_N = spec.crew.reduce((sum, c) => sum + c.mass_kg * G * factor.value, 0);
    const settings = floorSolveSettings(data, appliedLoad_N);
    return { settings, head: { factor: factor.value, factorSource: factor.source, tolerance_N: settings.tolerance_N, appliedLoad_N, weave: s.weave, pretension_N: s.pretension_N, EA_N } };
  });
  if (!heads.length) return [];
  const made = setup ?? floorSetup(spec, data, options);
  if (!made.built) return heads.map(({ head }) => declinedFloor(spec, head, made.count, made.maxNodes));
  const { floor, basis, frame, F, pairs, order, anchors } = made.built;
  const { maxIterations } = heads[0].settings;
  const K = new SkylineCholesky(floor.net.nodes.length, pairs, order);
  // The pretension alone, to the tightest tolerance asked: the same net and frame with no one aboard (kept by the setup).
  const tightest = Math.min(...heads.map((h) => h.settings.tolerance_N));
  const kept = made.built.rest.solve({ net: floor.net, F, frame }, tightest, maxIterations, K);
  const rest = kept.sol;
  // Every solve of this net shares the matrix and the strap system's preconditioner (each state starts near the last).
  const workspace = { matrix: K, coupling: { ...couplingPreconditioner(), factor: kept.factor } };
  const restFrame = frameResult(basis, frame, anchors, rest, kept.frame);
  const out = new Array<FloorModel>(factors.length);
  const given = options.start && options.start.sag.length === floor.net.nodes.length && options.start.pulls.length === floor.net.straps.length ? options.start : undefined;
  // The states solved so far, lightest first (the state given counts where its load is known).
  const solved: Solved[] = given?.appliedLoad_N !== undefined ? [{ state: given, load: given.appliedLoad_N }] : [];
  for (const i of [...factors.keys()].sort((p, q) => heads[p].head.appliedLoad_N - heads[q].head.appliedLoad_N)) {
    const { head, settings } = heads[i];
    const crew = crewLoads(spec, floor, head.factor);
    const loads = nodalLoads(floor, crew);
    // The lightest state starts from the state given, where it fits this net, or else from the sags on rigid anchors (a
    // rough, cheap solve) and the pretension's pulls; each heavier one from the states below (nextStart).
    const start = nextStart(solved, head.appliedLoad_N) ?? given ?? { sag: solveNet(floor.net, loads, { tolerance_N: START_FRACTION * Math.max(head.appliedLoad_N, 1), maxIterations }, undefined, K).sag, pulls: rest.pulls };
    const sol = solveCoupled(floor.net, loads, F, settings, start, workspace);
    if (sol.converged) solved.push({ state: sol, load: head.appliedLoad_N });
    out[i] = floorState(spec, floor, head, crew, sol, rest, F, workspace, restFrame(frame.solve(sol.pulls)), options.crewTangent ?? true);
  }
  return out;
}

/** The rigid-anchor start is solved to this fraction of the load: a start, not a result. */
const START_FRACTION = 1e-3;

export interface Solved {
  state: FloorStart;
  /** The crew's load on it, N. */
  load: number;
}

/**
 * Where a state of crew load `load` starts: on the line through the last two
 * states solved, where their loads differ (a secant predictor, as in
 * path-following methods: Allgower & Georg, Introduction to Numerical
 * Continuation Methods, SIAM 2003, ch. 5), else at the last one; none where
 * nothing is solved yet. The sags and pulls move nearly in proportion to the
 * load over a step, so the line starts nearer than the state below: on the
 * specs of this repository a loaded state takes 3 Newton steps where it took
 * 3 or 4. The answer is the same to the solver's tolerance from any start.
 */
export function nextStart(solved: readonly Solved[], load: number): FloorStart | undefined {
  const b = solved.at(-1);
  const a = solved.at(-2);
  if (!b || !a || b.load <= a.load) return b?.state;
  const t = (load - b.load) / (b.load - a.load);
  const along = (vb: Float64Array, va: Float64Array) => vb.map((v, i) => v + t * (v - va[i]));
  return { sag: along(b.state.sag, a.state.sag), pulls: along(b.state.pulls, a.state.pulls) };
}

function floorState(spec: CheckedSpecification, floor: FloorNet, head: FloorHead, crew: Loaded[], sol: CoupledSolution, rest: CoupledSolution, F: Float64Array, workspace: Required<CoupledWorkspace>, frame: FloorFrameResult, crewTangent: boolean): FloorModel {
  const s = spec.floor_straps;
  // Tensions at the plan lengths the anchors' movement left.
  const T = tensions(floor.net, sol.sag, sol.flats);
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
    crew: crewResults(floor, sol.sag, crew, crewTangent ? coupledCompliance(floor.net, sol, F, workspace.matrix, workspace.coupling) : null),
    rails: strapPulls(floor, sol.pulls),
    reactionSum_N: reactionSum(floor.net, sol.sag, T, sol.flats),
    nodes: floor.net.nodes.length,
    segments: floor.net.segments.length,
    clearances: partClearances(spec, floor, sol.sag),
    straps: strapTensions(floor.net, T),
    history: sol.history,
    frame,
    ...(converged ? { solution: { sag: sol.sag, pulls: sol.pulls, appliedLoad_N: head.appliedLoad_N } } : {}),
    ...(stopped ? { stopped } : {}),
  };
}

/** The frame's result for one state, given its state under that state's pulls; the pretension alone solved once. */
function frameResult(basis: FrameBasis, frame: FloorFrame, anchors: 'coupled' | 'fixed', rest: CoupledSolution, restState: FrameState): (state: FrameState) => FloorFrameResult {
  const pretension = { rails: restState.rails, minPull_N: Math.min(...rest.pulls), maxPull_N: Math.max(...rest.pulls), maxAnchorMove_mm: anchors === 'fixed' ? 0 : restState.maxAnchorMove_mm };
  return (state) => ({
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
    pretension,
    sources: basis.sources,
  });
}
