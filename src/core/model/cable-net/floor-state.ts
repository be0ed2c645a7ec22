import type { CheckedSpecification } from '../../spec/spec.types.ts';
import type { FloorResult } from '../floor-result.ts';
import type { FloorFrameResult } from '../floor-frame/frame-result.ts';
import type { PartClearance } from './clearance.ts';
import type { StrapTension } from './floor-results.ts';

// One solved (or declined) state of the strap floor, as floor-model.ts gives it.

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
  /** The solved sags and strap pulls, for a later solve of the same net to start from (absent where it did not converge). */
  solution?: FloorStart;
}

/** A solved state of a net: each node's sag, mm, and each strap's pull on the frame, N. */
export interface FloorStart {
  sag: Float64Array;
  pulls: Float64Array;
  /** The crew's load it carries, N, where known: a heavier state may then start on the line through it and the next. */
  appliedLoad_N?: number;
}
