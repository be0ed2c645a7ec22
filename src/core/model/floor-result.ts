// What the strap-floor model hands to the other rules (members, lashings,
// later the ride model). Implemented by the cable-net solver.

export interface CrewOnFloor {
  role: string;
  /** Load put on the floor by this person (weight times the case's factor), N. */
  load_N: number;
  /** Sag of the floor under the centre of the foot patch (see sagRead), mm. */
  sag_mm: number;
  /** Load over sag, N/mm. */
  secantStiffness_N_per_mm: number;
  /** d(load)/d(sag) at this load, N/mm; NaN where the state was solved without it (a check's loaded states: only the standing floor's is read). */
  tangentStiffness_N_per_mm: number;
  /** 'patch' where the centre of the foot patch is over the frame and the sag is the load-weighted mean under the patch instead. */
  sagRead?: 'patch';
}

export interface RailPull {
  rail: 'front' | 'rear' | 'left' | 'right';
  /** Clear span of the rail between the frame corners, mm. */
  span_mm: number;
  /** Largest strap pull per unit length along the rail, N/mm (in the plane of the floor, inwards). */
  lineLoad_N_per_mm: number;
  /** Sum of the strap pulls on this rail, N. */
  total_N: number;
  /** Each strap end's pull, at its distance along the rail from the rail's first corner, mm and N. */
  pulls: { at_mm: number; force_N: number }[];
}

export interface FloorResult {
  /** The load factor on the crew's weight in this case (1 for static). */
  factor: number;
  factorSource: string;
  converged: boolean;
  iterations: number;
  /** Largest out-of-balance nodal force at the end, N; the tolerance it was solved to. */
  residual_N: number;
  tolerance_N: number;
  maxTension_N: number;
  /** Where the largest tension sits, in words (e.g. "side-to-side strap 7, segment 3"). */
  maxTensionAt: string;
  maxStress_MPa: number;
  crew: CrewOnFloor[];
  rails: RailPull[];
  /** Sum of the vertical reactions at the frame, N (equals the applied load at equilibrium). */
  reactionSum_N: number;
  appliedLoad_N: number;
}
