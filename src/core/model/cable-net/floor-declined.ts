import { G } from '../../units/units.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import type { FloorModel } from './floor-state.ts';

// A net too large to solve within the check's time: every result unknown
// (NaN, which the floor's figures show as not applicable with the reason in
// `stopped`), reported as not converged.

export type FloorHead = Pick<FloorModel, 'factor' | 'factorSource' | 'tolerance_N' | 'appliedLoad_N' | 'weave' | 'pretension_N' | 'EA_N'>;

export function declinedFloor(spec: CheckedSpecification, head: FloorHead, count: number, maxNodes: number): FloorModel {
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
