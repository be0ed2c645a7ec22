// The search for the spokes that bear (wheel-ring.ts): a spoke takes
// compression only, so one whose force would turn to tension goes slack and
// the ring is solved again, one change at a time, until no spoke changes.
// The ring's solve is the caller's (a fresh one, or a factor kept for the set
// of bearing spokes). The search starts with every spoke bearing, or from a
// set the caller guesses (a neighbouring contact position's): the spokes
// only push, so the ring's energy has one minimum and the set that settles is
// the same from any start (bar a spoke whose force is within the tolerance of
// nil), and so is every number solved with it; a good guess only saves rounds.

import { angleApart } from './ring-mesh.ts';

/** A spoke force this small against the loads (P + C0) is nil: it neither drops a spoke nor brings one back. */
const TOLERANCE = 1e-6;

export interface SpokeSearch {
  /** Node angles, rad, and the node of each spoke. */
  nodes: readonly number[];
  spokeNodes: readonly number[];
  /** Axial stiffness of a spoke, N/mm, its pre-compression, N, and the ground load, N. */
  k: number;
  C0: number;
  P: number;
  /** Rounds allowed before the search stops unsettled. */
  limit: number;
  /** The ring's displacements with these spokes bearing (a slack one's C0 taken off the rim). */
  solve(active: readonly boolean[]): Float64Array;
  /** The bearing spokes to start from; every spoke where omitted. */
  start?: readonly boolean[];
}

export interface SpokeSearchEnd {
  /** The bearing spokes of the last round, and each spoke's force under that round's load (C0 + k·δ, negative: it would pull). */
  active: boolean[];
  would: number[];
  /** The last round's displacements. */
  u: Float64Array;
  rounds: number;
  /** Why the search stopped without settling, with the force left of the wrong sign; absent where it settled. */
  unsettled?: string;
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

/** The largest force of the wrong sign: a bearing spoke pulled, or a slack one that would push, N. */
function wrongSign(active: readonly boolean[], would: readonly number[]): number {
  return Math.max(0, ...would.map((w, i) => (active[i] ? -w : w)));
}

export function searchSlackSpokes(s: SpokeSearch): SpokeSearchEnd {
  const { nodes, spokeNodes } = s;
  let active = s.start ? [...s.start] : spokeNodes.map(() => true);
  const seen = new Set<string>([active.map((a) => (a ? 1 : 0)).join('')]);
  for (let round = 1; round <= s.limit; round++) {
    const u = s.solve(active);
    // Each spoke's force from its node's inward movement under the ground load (the nave fixed), whether or not it bore this round.
    const would = spokeNodes.map((node) => s.C0 - s.k * (u[3 * node] * Math.sin(nodes[node]) - u[3 * node + 1] * Math.cos(nodes[node])));
    const next = nextActive(active, would, TOLERANCE * (s.P + s.C0));
    if (next === null) return { active, would, u, rounds: round };
    const key = next.map((a) => (a ? 1 : 0)).join('');
    // Stopped: a set seen before (the search would cycle) or the last round, its state handed on with the reason.
    const stop = seen.has(key) ? 'it came back to a set of bearing spokes it had tried' : round === s.limit ? `it changed the bearing spokes ${round} times, its limit` : undefined;
    if (stop !== undefined) {
      return { active, would, u, rounds: round, unsettled: `the search for slack spokes did not settle: ${stop}; a spoke is left ${wrongSign(active, would).toFixed(1)} N from the force its state allows` };
    }
    seen.add(key);
    active = next;
  }
  throw new Error('the slack-spoke search needs at least one round');
}

/**
 * A guess at the bearing spokes from a solution at a nearby contact position
 * (`near`: its spokes, at their angles from its contact): each spoke takes the
 * state of the nearest of them in angle. Spokes that lean the same way from
 * the contact bear alike, so a step of the contact round the rim mostly keeps
 * the set.
 */
export function nearbyBearing(near: readonly { angle: number; active: boolean }[], angles: readonly number[]): boolean[] {
  return angles.map((a) => near.reduce((best, s) => (angleApart(s.angle, a) < angleApart(best.angle, a) ? s : best)).active);
}
