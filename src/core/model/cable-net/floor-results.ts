import type { CrewOnFloor, RailPull } from '../floor-result.ts';
import type { FootPatch, NodeWeight } from './foot-patch.ts';
import type { FloorNet } from './floor-net.ts';
import type { CableNet, Family } from './net.ts';
import type { Rail } from './outline.ts';
import { pointWeights, weightedSum } from './point-sag.ts';
import { scratchState, segmentState } from './segment.ts';

// What a solved net means for the floor: tensions, sag and stiffness under
// each person, the straps' pull on the rails and the frame's reactions.

const at = (u: ArrayLike<number>, i: number) => (i < 0 ? 0 : u[i]);

export interface Loaded {
  role: string;
  load_N: number;
  patch: FootPatch;
  weights: NodeWeight[];
}

/** Each segment's tension at the sags; `flats` the segments' plan lengths where the anchors moved (their own where omitted). */
export function tensions(net: CableNet, sag: ArrayLike<number>, flats?: ArrayLike<number>): Float64Array {
  const st = scratchState();
  return Float64Array.from(net.segments, (seg, i) => segmentState(seg, at(sag, seg.a), at(sag, seg.b), flats ? flats[i] : seg.flat, st).tension);
}

/** One strap's place in plan and the largest tension along it, for the floor drawing. */
export interface StrapTension {
  family: Family;
  number: number;
  /** y of a front-to-back strap, x of a side-to-side one, mm. */
  cross: number;
  /** Its ends along its own direction, mm. */
  start: number;
  end: number;
  maxTension_N: number;
}

/** The largest segment tension of each strap. */
export function strapTensions(net: CableNet, T: ArrayLike<number>): StrapTension[] {
  return net.straps.map((strap) => {
    let max = 0;
    for (let i = 0; i < strap.points.length - 1; i++) max = Math.max(max, T[strap.firstSegment + i]);
    return { family: strap.family, number: strap.number, cross: strap.cross, start: strap.points[0].s, end: strap.points[strap.points.length - 1].s, maxTension_N: max };
  });
}

export function describeSegment(net: CableNet, index: number): string {
  const seg = net.segments[index];
  const strap = net.straps[seg.strap];
  const axis = strap.family === 'front-to-back' ? 'y' : 'x';
  return `${strap.family} strap ${strap.number} of ${strap.of} (${axis} = ${strap.cross.toFixed(0)} mm), segment ${index - strap.firstSegment + 1} of ${strap.points.length - 1}`;
}

/**
 * Sag, secant and tangent stiffness under each person, read at the centre of
 * their foot patch (or, where the centre is over the frame and does not sag,
 * as the load-weighted mean under the patch); the tangent from the
 * sags a unit load on the patch adds, by `compliance` (the coupled tangent of
 * the solved state). Null (a net the solver declined, or no tangent) leaves
 * the tangent unknown (NaN).
 */
export function crewResults(floor: FloorNet, sag: ArrayLike<number>, crew: readonly Loaded[], compliance: ((p: Float64Array) => Float64Array) | null): CrewOnFloor[] {
  const n = floor.net.nodes.length;
  return crew.map((c) => {
    const centre = pointWeights(floor.net, floor.outline, c.patch.x, c.patch.y);
    // A centre over the frame (a person standing at the edge) does not sag: read the mean under the patch, where the load is.
    const atCentre = weightedSum(centre, sag) > 0;
    const read = atCentre ? centre : c.weights;
    const s = weightedSum(read, sag);
    let tangent = NaN;
    if (compliance) {
      const unit = new Float64Array(n);
      for (const { node, w } of c.weights) unit[node] += w;
      tangent = 1 / weightedSum(read, compliance(unit));
    }
    return { role: c.role, load_N: c.load_N, sag_mm: s, secantStiffness_N_per_mm: c.load_N / s, tangentStiffness_N_per_mm: tangent, ...(atCentre ? {} : { sagRead: 'patch' as const }) };
  });
}

/**
 * Each strap's pull on its two anchors (the pull the frame carries), gathered
 * by the rail it pulls on: front-to-back straps on the rear and front rails,
 * side-to-side straps on the side rails. Spans are the clear inner depth and
 * width.
 */
export function strapPulls(floor: FloorNet, pulls: ArrayLike<number>): RailPull[] {
  const { net, outline, pitch } = floor;
  const spans: Record<Rail, number> = { front: outline.width, rear: outline.width, left: outline.depth, right: outline.depth };
  const out = new Map<Rail, RailPull>((['front', 'rear', 'left', 'right'] as const).map((r) => [r, { rail: r, span_mm: spans[r], lineLoad_N_per_mm: 0, total_N: 0, pulls: [] as RailPull['pulls'] }]));
  net.straps.forEach((strap, s) => {
    for (const rail of strap.rails) {
      const r = out.get(rail)!;
      r.total_N += pulls[s];
      // Front and rear rails run across y (from the right corner); side rails along x.
      r.pulls.push({ at_mm: strap.family === 'front-to-back' ? strap.cross + outline.width / 2 : strap.cross, force_N: pulls[s] });
      r.lineLoad_N_per_mm = Math.max(r.lineLoad_N_per_mm, pulls[s] / pitch);
    }
  });
  return [...out.values()];
}

/** Sum of the vertical forces the frame gives the strap ends, N; `flats` as for `tensions`. */
export function reactionSum(net: CableNet, sag: ArrayLike<number>, T: ArrayLike<number>, flats?: ArrayLike<number>): number {
  let sum = 0;
  net.segments.forEach((seg, i) => {
    if (seg.a >= 0 && seg.b >= 0) return;
    const st = segmentState(seg, at(sag, seg.a), at(sag, seg.b), flats ? flats[i] : seg.flat);
    // The free end's sag over the length: +drop when b is the fixed end, -drop when a is.
    sum += (T[i] * (seg.b < 0 ? st.drop : -st.drop)) / st.length;
  });
  return sum;
}
