import type { Segment } from './net.ts';

// One tension-only segment with its ends displaced vertically by ua and ub
// (sag, positive down; a fixed end has 0). Its plan length is `flat`, or a
// shorter one where the frame's anchors have moved in (frame-coupling.ts).

export interface SegmentState {
  /** Current length. */
  length: number;
  /** ua - ub: how far end a hangs below end b. */
  drop: number;
  /** max(0, EA (l - l_0) / l_0). */
  tension: number;
  /** Its plan length. */
  flat: number;
}

/** `into`: a state to fill in place of a new one (a loop over every segment then allocates nothing). */
export function segmentState(seg: Segment, ua: number, ub: number, flat = seg.flat, into?: SegmentState): SegmentState {
  const drop = ua - ub;
  // √(f² + d²) rather than Math.hypot: the same to the last bits at these sizes, and several times faster.
  const length = Math.sqrt(flat * flat + drop * drop);
  const tension = length > seg.rest ? (seg.EA * (length - seg.rest)) / seg.rest : 0;
  if (!into) return { length, drop, tension, flat };
  into.length = length;
  into.drop = drop;
  into.tension = tension;
  into.flat = flat;
  return into;
}

/** A state to fill again and again (segmentState's `into`). */
export function scratchState(): SegmentState {
  return { length: 0, drop: 0, tension: 0, flat: 0 };
}

/** The tension's horizontal part T·f/l: the pull along the strap on the anchors. */
export function horizontalPull(st: SegmentState): number {
  return (st.tension * st.flat) / st.length;
}

/** Upward pull of the segment on end a (and downward on end b): T (ua - ub) / l. */
export function verticalPull(st: SegmentState): number {
  return (st.tension * st.drop) / st.length;
}

/** Strain energy: EA (l - l_0)^2 / (2 l_0) when taut, 0 when slack. */
export function strainEnergy(seg: Segment, st: SegmentState): number {
  const stretch = st.length - seg.rest;
  return stretch > 0 ? (seg.EA * stretch * stretch) / (2 * seg.rest) : 0;
}

/**
 * d(pull)/d(drop): the geometric term T/l plus the elastic term
 * (drop/l)^2 (EA/l_0 - T/l); zero for a slack segment. `floorTension` stands
 * in for T in the geometric term when the segment is slacker than that, so a
 * net without pretension still has a positive stiffness at the start; the
 * residual, not this matrix, decides convergence.
 */
export function tangentStiffness(seg: Segment, st: SegmentState, floorTension = 0): number {
  const geometric = Math.max(st.tension, floorTension) / st.length;
  if (st.tension <= 0) return geometric;
  const c = st.drop / st.length;
  return geometric + c * c * (seg.EA / seg.rest - st.tension / st.length);
}

/**
 * The segment energy's second derivatives in its plan length f and its drop d
 * (U a function of l = hypot(f, d)): T/l (1 − n nᵀ) + (EA/l_0) n nᵀ with
 * n = (f, d)/l; zero for a slack segment. `into`: a pair to fill in place of a new one (a loop over every segment
 * then allocates nothing).
 */
export function planCurvatures(seg: Segment, st: SegmentState, into: { ff: number; fd: number } = { ff: 0, fd: 0 }): { ff: number; fd: number } {
  if (st.tension <= 0) {
    into.ff = 0;
    into.fd = 0;
    return into;
  }
  const s = st.flat / st.length;
  const c = st.drop / st.length;
  const g = st.tension / st.length;
  into.ff = g * (1 - s * s) + (seg.EA / seg.rest) * s * s;
  into.fd = (seg.EA / seg.rest - g) * s * c;
  return into;
}
