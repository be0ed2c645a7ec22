import { nodeAt, ringNodes, wrapAngle } from './ring-mesh.ts';
import { RingNotHeld, solveRingFrame, type RingLoad, type RingSolution, type RingSpring } from './ring-frame.ts';

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

/** A spoke force this small against the loads (P + C0) is nil: it neither drops a spoke nor brings one back. */
const TOLERANCE = 1e-6;

/** Bending stiffness across a spoke, as a fraction of k·L² (under a millionth of a real spoke's; much smaller and a ring hinged at every joint loses digits). */
const TOKEN = 1e-7;

/** Spoke angles from the contact. */
export function spokeAngles(spokes: number, offset: number): number[] {
  return Array.from({ length: spokes }, (_, k) => wrapAngle(offset + (TWO_PI * k) / spokes));
}

/**
 * The next set of bearing spokes, one change at a time: the spoke whose force
 * would be the most tensile leaves, or else the slack spoke that would be the
 * most compressed comes back; null when every bearing spoke pushes and no
 * slack one would. (Dropping every tensile spoke at once can overshoot: a
 * ring hinged at the contact may put them all in tension before it settles
 * on the two spokes beside the contact.)
 */
function nextActive(active: readonly boolean[], would: readonly number[], tol: number): boolean[] | null {
  let worst = -1;
  active.forEach((a, i) => {
    if (a && would[i] < -tol && (worst < 0 || would[i] < would[worst])) worst = i;
  });
  if (worst < 0) {
    active.forEach((a, i) => {
      if (!a && would[i] > tol && (worst < 0 || would[i] > would[worst])) worst = i;
    });
  }
  if (worst < 0) return null;
  return active.map((a, i) => (i === worst ? !a : a));
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
export function solveWheelRing(ring: WheelRing, load: WheelLoad): WheelRingResult {
  try {
    return solveHeldRing(ring, load);
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

function solveHeldRing(ring: WheelRing, load: WheelLoad): WheelRingResult {
  const span = (TWO_PI * ring.radius) / ring.spokes;
  const angles = spokeAngles(ring.spokes, load.spokeOffset);
  const hingeAngles = load.hinges ?? [];
  if (hingeAngles.length > 0 && ring.precompression > 0) throw new Error('a pre-compressed tyre ties the felloe joints: the ring has no hinges');
  const nodes = ringNodes([0, Math.PI, ...angles, ...hingeAngles, ...(load.nodesAt ?? [])], TWO_PI / ring.spokes / ring.elementsPerSpan);
  const spokeNodes = angles.map((a) => nodeAt(nodes, a));
  const hinges = hingeAngles.map((a) => nodeAt(nodes, a));
  const C0 = ring.precompression;
  const tyre = tyreState(ring, nodes, spokeNodes);
  const n = nodes.length;
  const struts = spokeNodes.map((node) => ({ node, EI: (ring.token ?? TOKEN) * ring.spokeStiffness * ring.spokeLength ** 2, length: ring.spokeLength }));
  let active = angles.map(() => true);
  const seen = new Set<string>([active.map(() => 1).join('')]);
  for (let round = 1; round <= 4 * ring.spokes; round++) {
    const springs = spokeNodes.filter((_, i) => active[i]).map((node): RingSpring => ({ node, direction: 'radial', k: ring.spokeStiffness }));
    // A slack spoke no longer pushes: its C0 comes off the rim.
    const released = spokeNodes.filter((_, i) => !active[i] && C0 > 0).map((node): RingLoad => ({ node, radial: -C0, tangential: 0 }));
    const sol = solveRingFrame({ radius: ring.radius, nodes, EA: ring.EA, EI: ring.EI, springs, struts, hinges, loads: [{ node: 0, radial: -load.P, tangential: 0 }, ...released] });
    // Each spoke's force from its node's inward movement under the ground load (the nave fixed), whether or not it bore this round.
    const outward = spokeNodes.map((node) => sol.u[3 * node] * Math.sin(nodes[node]) - sol.u[3 * node + 1] * Math.cos(nodes[node]));
    const would = outward.map((d) => C0 - ring.spokeStiffness * d);
    const next = nextActive(active, would, TOLERANCE * (load.P + C0));
    const key = next?.map((a) => (a ? 1 : 0)).join('');
    // Settled, or stopped: a set seen before (the search would cycle) or the last round, its state handed on with the reason.
    const stop = next === null ? null : seen.has(key!) ? 'it came back to a set of bearing spokes it had tried' : round === 4 * ring.spokes ? `it changed the bearing spokes ${round} times, its limit` : undefined;
    if (stop !== undefined) {
      const el = (j: number, which: 'N' | 'V') => (s: RingSolution | null) => (s ? s.elements[j][which] : 0);
      const elN = (j: number) => el(j, 'N')(sol) + el(j, 'N')(tyre);
      const elV = (j: number) => el(j, 'V')(sol) + el(j, 'V')(tyre);
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
        rounds: round,
        tokenForce: Math.max(...sol.strutForce),
        contactDeflection: -(sol.u[0] * Math.sin(nodes[0]) - sol.u[1] * Math.cos(nodes[0])),
        ...(stop === null ? {} : { unsettled: `the search for slack spokes did not settle: ${stop}; a spoke is left ${wrongSign(active, would).toFixed(1)} N from the force its state allows` }),
      };
    }
    seen.add(key!);
    active = next!;
  }
  // The last round always stops above; this only satisfies the compiler.
  throw new Error('unreachable: the slack-spoke search ran past its last round');
}

/** The largest force of the wrong sign: a bearing spoke pulled, or a slack one that would push, N. */
function wrongSign(active: readonly boolean[], would: readonly number[]): number {
  return Math.max(0, ...would.map((w, i) => (active[i] ? -w : w)));
}
