import type { BandCholesky } from './band-cholesky.ts';
import { RingNotHeld } from './ring-frame.ts';
import { nodeAt, sameMesh, turnedMesh, wrapAngle } from './ring-mesh.ts';
import type { RingSystem } from './ring-system.ts';
import { searchSlackSpokes } from './slack-spokes.ts';
import { bearingSprings, contactDeflection, groundLoads, solveWheelRing, wheelMesh, wheelSystem, type WheelLoad } from './wheel-ring.ts';
import type { WheelRingSpec } from './wheel-ring-spec.ts';

// How far the rim gives under the ground load with the contact at one angle
// of the wheel's frame, for many angles in turn (wheel-stiffness.ts). Seen
// from the wheel, moving the contact moves only the ground load: the spokes,
// the joints and their hinges stay where they are, and so does the mesh
// wherever the contact and the point opposite it fall on nodes it already
// has. Positions whose mesh, turned into the wheel's frame, is the same share
// one assembled ring and one factor for each set of bearing spokes; at each,
// the slack-spoke search is the one solveWheelRing runs (the same answer, to
// rounding: tests/wheel/rim-give.test.ts). A position whose mesh differs gets
// a ring of its own; one the spokes do not hold is handed to solveWheelRing
// for its reason.

export interface RimGive {
  /** The contact's inward movement under the load, mm; NaN where the ring could not be solved. */
  deflection: number;
  /** Why the slack-spoke search did not settle, or why the ring could not be solved; absent where it settled. */
  unsettled?: string;
}

interface SharedRing {
  /** Node angles in the wheel's frame. */
  nodes: number[];
  spokeNodes: number[];
  system: RingSystem;
  /** A factor for each set of bearing spokes met so far ('1' bearing, '0' slack, spoke by spoke). */
  factors: Map<string, BandCholesky>;
}

export class RimGiveScan {
  readonly #ws: WheelRingSpec;
  readonly #P: number;
  readonly #rings: SharedRing[] = [];

  /** `P` the ground load, N. */
  constructor(ws: WheelRingSpec, P: number) {
    this.#ws = ws;
    this.#P = P;
  }

  /** The ground load with the contact at `at` (the wheel's frame, rad), as solveWheelRing takes it: angles from the contact. */
  load(at: number): WheelLoad {
    const joints = this.#ws.joints.angles.map((j) => wrapAngle(j - at));
    return { P: this.#P, spokeOffset: wrapAngle(-at), hinges: this.#ws.hinged ? joints : [], nodesAt: joints };
  }

  /** The rim's give with the contact at `at`, rad in the wheel's frame. */
  at(at: number): RimGive {
    const { ring } = this.#ws;
    const load = this.load(at);
    const shared = this.#ringFor(turnedMesh(wheelMesh(ring, load).nodes, at));
    const { nodes, spokeNodes, system, factors } = shared;
    const contact = nodeAt(nodes, at);
    const factorFor = (active: readonly boolean[]): BandCholesky => {
      const key = active.map((a) => (a ? '1' : '0')).join('');
      let K = factors.get(key);
      if (!K) factors.set(key, (K = system.factorWith(bearingSprings(ring, spokeNodes, active))));
      return K;
    };
    try {
      const end = searchSlackSpokes({
        nodes, spokeNodes, k: ring.spokeStiffness, C0: ring.precompression, P: this.#P, limit: 4 * ring.spokes,
        solve: (active) => factorFor(active).solve(system.loadVector(groundLoads(ring, this.#P, contact, spokeNodes, active))),
      });
      return { deflection: contactDeflection(end.u, nodes, contact), ...(end.unsettled === undefined ? {} : { unsettled: end.unsettled }) };
    } catch (e) {
      if (!(e instanceof RingNotHeld)) throw e;
      const r = solveWheelRing(ring, load);
      return { deflection: r.contactDeflection, ...(r.unsettled === undefined ? {} : { unsettled: r.unsettled }) };
    }
  }

  /** The shared ring of this mesh (wheel's frame), assembled the first time it is met. */
  #ringFor(nodes: number[]): SharedRing {
    const found = this.#rings.find((r) => sameMesh(r.nodes, nodes));
    if (found) return found;
    const { ring, joints, hinged } = this.#ws;
    const spokeNodes = Array.from({ length: ring.spokes }, (_, k) => nodeAt(nodes, (2 * Math.PI * k) / ring.spokes));
    const hinges = hinged ? joints.angles.map((j) => nodeAt(nodes, j)) : [];
    const made = { nodes, spokeNodes, system: wheelSystem(ring, nodes, spokeNodes, hinges), factors: new Map<string, BandCholesky>() };
    this.#rings.push(made);
    return made;
  }
}
