import { nodeAt, ringNodes, wrapAngle } from './ring-mesh.ts';
import { RingNotHeld, solveRingFrame, type RingLoad, type RingSolution, type RingSpring } from './ring-frame.ts';
import type { BandCholesky } from './band-cholesky.ts';
import { RingSystem } from './ring-system.ts';
import { nearbyBearing, searchSlackSpokes, type SpokeSearchEnd } from './slack-spokes.ts';

// The wheel as a ring frame (design basis, section 6): the felloe a closed
// ring of straight beam elements on its mid-depth radius, the spokes axial
// members from a fixed nave to the rim, the ground load P at the contact
// pushing the rim towards the hub. A spoke takes compression only: one whose
// force would turn to tension goes slack and the ring is solved again, until
// no spoke changes.
//
// A tyre's pre-compression C0 per spoke is a state of its own, in balance
// without the ground: each spoke pushes the rim out with C0 and the tyre
// presses it in with n·C0 spread evenly round the rim, which bends the felloe
// between the spokes (the tyre's own bending stiffness is left out: the safe
// side for the felloe). The ground load then acts on that state: each spoke
// bears C0 + k·δ (δ its shortening under the ground load) and goes slack only
// when that would turn to tension, which takes its C0 push off the rim.
//
// The spokes are axial struts that can only push (a spring each, taken out
// when slack). Every force on the ring then passes through the hub (the
// ground load at the contact, the spokes, the tyre's pressure), so the ring's
// rigid turn about the hub, which radial struts do not hold, is not loaded.
// A token stiffness across each spoke (TOKEN of its axial stiffness, as a
// fixed-ended beam) removes that turn, and takes next to nothing from a
// continuous ring. A ring hinged at every joint, though, leans on it: its
// segments would slide round on pinned spokes, and what the token then takes
// (`tokenForce`) is what the spokes' tenons must hold sideways. Either way
// the answer does not depend on the token's size (tests/wheel).
//
// A felloe joint that cannot pass a moment (ends butted on dowels, with no
// tyre to tie them) is a hinge of the ring: it passes the rim's shear and hoop
// force only.

export interface WheelRing {
  /** The felloe's mid-depth radius, mm. */
  radius: number;
  spokes: number;
  /** The felloe section's E·I, N·mm², and E·A, N. */
  EI: number;
  EA: number;
  /** Axial stiffness of one spoke, E·A/L, N/mm. */
  spokeStiffness: number;
  /** Free length of a spoke, mm (for its token stiffness across). */
  spokeLength: number;
  /** The tyre's pre-compression on each spoke, N; 0 for spokes that can only push. */
  precompression: number;
  /** Elements per spoke span (the mesh; the model converges as its square). */
  elementsPerSpan: number;
  /** The token stiffness across a spoke as a fraction of k·L², where a test varies it; else TOKEN. */
  token?: number;
}

export interface WheelLoad {
  /** The ground load, N. */
  P: number;
  /** Angle from the contact, counter-clockwise, to the first spoke, rad: 0 puts the contact under a spoke, π/n midway between two. */
  spokeOffset: number;
  /** Angles (from the contact) of felloe joints that carry no moment, rad; none where a tyre's pre-compression ties them. */
  hinges?: readonly number[];
  /** Further angles (from the contact) that must be nodes, rad. */
  nodesAt?: readonly number[];
}

export interface SpokeState {
  /** Angle of the spoke from the contact, rad. */
  angle: number;
  /** Compression, N; 0 for a slack spoke. */
  force: number;
  active: boolean;
}

export interface WheelRingResult {
  ring: WheelRing;
  load: WheelLoad;
  /** Node angles from the contact, rad. */
  nodes: number[];
  /** Moment at each node, N·mm, positive where the inner face is in tension. */
  moment: number[];
  /** Hoop force at each node (the mean of its two elements), tension positive, N. */
  hoop: number[];
  /** Largest shear beside each node (of its two elements), N. */
  shear: number[];
  spokes: SpokeState[];
  /** The node of the largest moment in size. */
  peak: { node: number; angle: number; moment: number; hoop: number };
  /** Spoke span 2πR/n, mm. */
  span: number;
  /** |M|max / (P·span). */
  coefficient: number;
  /** Rounds of the slack-spoke search. */
  rounds: number;
  /** The largest force the token stiffness across the spokes takes, N: what the spokes' tenons hold sideways. */
  tokenForce: number;
  /** How far the rim moves in towards the nave under the ground load, mm (the wheel's own radial compliance, joints rigid). */
  contactDeflection: number;
  /** Why the slack-spoke search stopped without settling (its last state is given), with the force left of the wrong sign; absent where it settled. */
  unsettled?: string;
}

const TWO_PI = 2 * Math.PI;

/** Bending stiffness across a spoke, as a fraction of k·L² (under a millionth of a real spoke's; much smaller and a ring hinged at every joint loses digits). */
const TOKEN = 1e-7;

/** Spoke angles from the contact. */
export function spokeAngles(spokes: number, offset: number): number[] {
  return Array.from({ length: spokes }, (_, k) => wrapAngle(offset + (TWO_PI * k) / spokes));
}

/** The pre-compression state alone: the free ring under the spokes' pushes and the tyre's pressure (three token holds; in balance, they take nothing). */
function tyreState(ring: WheelRing, nodes: readonly number[], spokeNodes: readonly number[]): RingSolution | null {
  const C0 = ring.precompression;
  if (C0 === 0) return null;
  const k = ring.spokeStiffness;
  const holds: RingSpring[] = [
    { node: 0, direction: 'radial', k },
    { node: 0, direction: 'tangential', k },
    { node: nodeAt(nodes, Math.PI), direction: 'tangential', k },
  ];
  const pushes = spokeNodes.map((node): RingLoad => ({ node, radial: C0, tangential: 0 }));
  return solveRingFrame({ radius: ring.radius, nodes, EA: ring.EA, EI: ring.EI, springs: holds, loads: pushes, pressure: (ring.spokes * C0) / (TWO_PI * ring.radius) });
}

/**
 * The ring under a ground load; a ring its spokes do not hold (felloe joints
 * hinged so close together that a length of rim between two spokes is a
 * mechanism) gives no numbers, only the reason, in `unsettled`.
 */
export function solveWheelRing(ring: WheelRing, load: WheelLoad, kept?: HeldRingCache, near?: WheelRingResult): WheelRingResult {
  try {
    return solveHeldRing(ring, load, kept, near);
  } catch (e) {
    if (!(e instanceof RingNotHeld)) throw e;
    const hinged = (load.hinges ?? []).length;
    const why = `${e.message}${hinged ? ` (${hinged} felloe joints hinged on ${ring.spokes} spokes: a length of rim between two spokes is a mechanism)` : ''}`;
    return notHeld(ring, load, why);
  }
}

/** A ring with no solution: every force nil, the give unknown (NaN), the reason kept. */
function notHeld(ring: WheelRing, load: WheelLoad, why: string): WheelRingResult {
  const nodes = [0];
  return {
    ring, load, nodes, moment: [0], hoop: [0], shear: [0],
    spokes: spokeAngles(ring.spokes, load.spokeOffset).map((angle) => ({ angle, force: 0, active: false })),
    peak: { node: 0, angle: 0, moment: 0, hoop: 0 },
    span: (TWO_PI * ring.radius) / ring.spokes,
    coefficient: NaN, rounds: 0, tokenForce: 0, contactDeflection: NaN,
    unsettled: `the ring model could not be solved: ${why}`,
  };
}

/** The ring's mesh under a load: nodes at the contact, opposite it, at every spoke and hinge and at the angles asked for. */
export function wheelMesh(ring: WheelRing, load: WheelLoad) {
  const angles = spokeAngles(ring.spokes, load.spokeOffset);
  const hingeAngles = load.hinges ?? [];
  const nodes = ringNodes([0, Math.PI, ...angles, ...hingeAngles, ...(load.nodesAt ?? [])], TWO_PI / ring.spokes / ring.elementsPerSpan);
  return { angles, hingeAngles, nodes };
}

/** The ring on its spokes' token struts, hinged at `hinges`: what stays while the bearing spokes change. */
export function wheelSystem(ring: WheelRing, nodes: readonly number[], spokeNodes: readonly number[], hinges: readonly number[]): RingSystem {
  const struts = spokeNodes.map((node) => ({ node, EI: (ring.token ?? TOKEN) * ring.spokeStiffness * ring.spokeLength ** 2, length: ring.spokeLength }));
  return new RingSystem({ radius: ring.radius, nodes, EA: ring.EA, EI: ring.EI, struts, hinges });
}

/** The bearing spokes as radial springs. */
export function bearingSprings(ring: WheelRing, spokeNodes: readonly number[], active: readonly boolean[]): RingSpring[] {
  return spokeNodes.filter((_, i) => active[i]).map((node): RingSpring => ({ node, direction: 'radial', k: ring.spokeStiffness }));
}

/** The ground load P at the contact node, and a slack spoke's C0 off the rim (it no longer pushes). */
export function groundLoads(ring: WheelRing, P: number, contact: number, spokeNodes: readonly number[], active: readonly boolean[]): RingLoad[] {
  const C0 = ring.precompression;
  const released = spokeNodes.filter((_, i) => !active[i] && C0 > 0).map((node): RingLoad => ({ node, radial: -C0, tangential: 0 }));
  return [{ node: contact, radial: -P, tangential: 0 }, ...released];
}

/**
 * The ring for one contact position, whatever the ground load's size: its
 * mesh, the tyre's state, the assembled ring and a factor for each set of
 * bearing spokes met. A scan that solves several loads at one position keeps
 * it (HeldRingCache); every number is computed as a fresh solve computes it.
 */
interface HeldRing {
  angles: number[];
  nodes: number[];
  spokeNodes: number[];
  tyre: RingSolution | null;
  system: RingSystem;
  factorFor: (active: readonly boolean[]) => BandCholesky;
}

function heldRing(ring: WheelRing, load: WheelLoad): HeldRing {
  if ((load.hinges ?? []).length > 0 && ring.precompression > 0) throw new Error('a pre-compressed tyre ties the felloe joints: the ring has no hinges');
  const { angles, hingeAngles, nodes } = wheelMesh(ring, load);
  const spokeNodes = angles.map((a) => nodeAt(nodes, a));
  const hinges = hingeAngles.map((a) => nodeAt(nodes, a));
  const tyre = tyreState(ring, nodes, spokeNodes);
  const system = wheelSystem(ring, nodes, spokeNodes, hinges);
  const factors = new Map<string, BandCholesky>();
  return {
    angles, nodes, spokeNodes, tyre, system,
    factorFor: (active) => {
      const key = active.map((a) => (a ? '1' : '0')).join('');
      let K = factors.get(key);
      if (!K) factors.set(key, (K = system.factorWith(bearingSprings(ring, spokeNodes, active))));
      return K;
    },
  };
}

/** The ring of one contact position kept while loads of several sizes are solved at it (wheel-ring-scan.ts). */
export class HeldRingCache {
  #held: HeldRing | undefined;
  get(ring: WheelRing, load: WheelLoad): HeldRing {
    return (this.#held ??= heldRing(ring, load));
  }
}

/**
 * The slack-spoke search, started from the bearing spokes of `near` (a settled solution at a nearby contact) where
 * given: the same set settles from any start, in fewer rounds from a good one. A guess that does not settle, or
 * leaves the ring unheld, is dropped and the search runs from every spoke bearing, as without one.
 */
function searchFromNear(search: (start?: readonly boolean[]) => SpokeSearchEnd, angles: readonly number[], near?: WheelRingResult): SpokeSearchEnd {
  if (near && near.unsettled === undefined) {
    try {
      const end = search(nearbyBearing(near.spokes, angles));
      if (end.unsettled === undefined) return end;
    } catch (e) {
      if (!(e instanceof RingNotHeld)) throw e;
    }
  }
  return search();
}

function solveHeldRing(ring: WheelRing, load: WheelLoad, kept?: HeldRingCache, near?: WheelRingResult): WheelRingResult {
  const span = (TWO_PI * ring.radius) / ring.spokes;
  const { angles, nodes, spokeNodes, tyre, system, factorFor } = kept ? kept.get(ring, load) : heldRing(ring, load);
  const n = nodes.length;
  const search = (start?: readonly boolean[]) =>
    searchSlackSpokes({
      nodes, spokeNodes, k: ring.spokeStiffness, C0: ring.precompression, P: load.P, limit: 4 * ring.spokes, start,
      solve: (active) => factorFor(active).solve(system.loadVector(groundLoads(ring, load.P, 0, spokeNodes, active))),
    });
  const end = searchFromNear(search, angles, near);
  const { active, would, u } = end;
  const sol = system.solution(u, bearingSprings(ring, spokeNodes, active));
  // Each element's axial and shear force, the tyre's state added where there is one.
  const elN = (j: number) => sol.elements[j].N + (tyre ? tyre.elements[j].N : 0);
  const elV = (j: number) => sol.elements[j].V + (tyre ? tyre.elements[j].V : 0);
  const moment = sol.moment.map((m, j) => m + (tyre ? tyre.moment[j] : 0));
  const hoop = nodes.map((_, j) => (elN((j - 1 + n) % n) + elN(j)) / 2);
  const shear = nodes.map((_, j) => Math.max(Math.abs(elV((j - 1 + n) % n)), Math.abs(elV(j))));
  const peakNode = moment.reduce((best, m, j) => (Math.abs(m) > Math.abs(moment[best]) ? j : best), 0);
  return {
    ring,
    load,
    nodes,
    moment,
    hoop,
    shear,
    spokes: angles.map((angle, i) => ({ angle, force: active[i] ? Math.max(0, would[i]) : 0, active: active[i] })),
    peak: { node: peakNode, angle: nodes[peakNode], moment: moment[peakNode], hoop: hoop[peakNode] },
    span,
    coefficient: load.P > 0 ? Math.abs(moment[peakNode]) / (load.P * span) : 0,
    rounds: end.rounds,
    tokenForce: Math.max(...sol.strutForce),
    contactDeflection: contactDeflection(u, nodes, 0),
    ...(end.unsettled === undefined ? {} : { unsettled: end.unsettled }),
  };
}

/** How far a node moves in towards the hub, mm. */
export function contactDeflection(u: Float64Array, nodes: readonly number[], node: number): number {
  return -(u[3 * node] * Math.sin(nodes[node]) - u[3 * node + 1] * Math.cos(nodes[node]));
}
