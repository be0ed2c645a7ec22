import type { Segment } from './net.ts';

// One tension-only segment with its ends displaced vertically by ua and ub
// (sag, positive down; a fixed end has 0). Its plan length stays `flat`.

export interface SegmentState {
  /** Current length. */
  length: number;
  /** ua - ub: how far end a hangs below end b. */
  drop: number;
  /** max(0, EA (l - l_0) / l_0). */
  tension: number;
}

export function segmentState(seg: Segment, ua: number, ub: number): SegmentState {
  const drop = ua - ub;
  const length = Math.hypot(seg.flat, drop);
  const tension = length > seg.rest ? (seg.EA * (length - seg.rest)) / seg.rest : 0;
  return { length, drop, tension };
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
