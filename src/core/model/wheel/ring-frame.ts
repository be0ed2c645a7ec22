import { SkylineCholesky } from '../cable-net/skyline.ts';
import { endForces, globalStiffness, type BeamElement } from './beam-element.ts';

/** The ring's stiffness matrix is singular: its springs leave part of it free to move (a mechanism). */
export class RingNotHeld extends Error {
  constructor() {
    super('the ring is not held: its springs leave it free to move as a rigid body');
    this.name = 'RingNotHeld';
  }
}

// A closed plane ring of straight beam elements through nodes on a circle of
// radius R, held by springs at some nodes (radial or tangential) and loaded by
// point forces at nodes, solved by the direct stiffness method. The node at
// angle θ (from the ground contact, counter-clockwise) sits at
// (R·sin θ, −R·cos θ), the hub at the origin. A hinge node passes force but
// no moment: the element ending there turns on a rotation of its own.

export type SpringDirection = 'radial' | 'tangential';

export interface RingSpring {
  node: number;
  direction: SpringDirection;
  /** N/mm. */
  k: number;
}

/** A strut from a node straight in towards the hub, fixed at its inner end, that resists bending only (its push is a spring of its own). */
export interface RingStrut {
  node: number;
  /** In-plane bending stiffness E·I, N·mm². */
  EI: number;
  /** Free length, mm. */
  length: number;
}

export interface RingLoad {
  node: number;
  /** Force along the outward radius, N (negative: inward). */
  radial: number;
  /** Force along the ring, counter-clockwise positive, N. */
  tangential: number;
}

export interface RingFrame {
  /** Radius of the nodes, mm. */
  radius: number;
  /** Node angles, ascending in [0, 2π). */
  nodes: readonly number[];
  /** Axial stiffness E·A of the ring's section, N. */
  EA: number;
  /** Bending stiffness E·I of the ring's section, N·mm². */
  EI: number;
  springs: readonly RingSpring[];
  /** Bending struts at nodes (the spokes' resistance to the rim turning and sliding round). */
  struts?: readonly RingStrut[];
  loads: readonly RingLoad[];
  /** An even pressure on the ring's outer face, inward, N per mm of element (optional). */
  pressure?: number;
  /** Nodes that carry no moment (a joint that can open). */
  hinges?: readonly number[];
}

export interface RingElementForces {
  /** Hoop force, tension positive, N. */
  N: number;
  /** Shear across the ring, N. */
  V: number;
  /** Moment at the element's start and end node, N·mm, positive where the inner face is in tension (the ring flattens). */
  M1: number;
  M2: number;
}

export interface RingSolution {
  /** Displacements, 3 per node: x, y (mm) and rotation (rad); then the end rotation at each hinge. */
  u: Float64Array;
  /** Element i runs from node i to node i + 1 (the last closes the ring). */
  elements: RingElementForces[];
  /** Moment at each node, N·mm, positive where the inner face is in tension. */
  moment: number[];
  /** Displacement of each spring's node along the spring's direction (outward or counter-clockwise), mm. */
  springStretch: number[];
  /** Size of the force each strut puts on its node, N. */
  strutForce: number[];
}

/** The unit vector of a direction at a node angle. */
export function directionAt(theta: number, d: SpringDirection): [number, number] {
  return d === 'radial' ? [Math.sin(theta), -Math.cos(theta)] : [Math.cos(theta), Math.sin(theta)];
}

function elementsOf(f: RingFrame): BeamElement[] {
  const n = f.nodes.length;
  const at = (j: number) => ({ x: f.radius * Math.sin(f.nodes[j]), y: -f.radius * Math.cos(f.nodes[j]) });
  return f.nodes.map((_, i) => {
    const a = at(i);
    const b = at((i + 1) % n);
    return { x1: a.x, y1: a.y, x2: b.x, y2: b.y, EA: f.EA, EI: f.EI };
  });
}

/**
 * Degree-of-freedom numbering: x, y, rotation of each node (3j, 3j+1, 3j+2),
 * and past them one more rotation per hinge, the end rotation of the element
 * that ends at the hinge. `place` is the stored order: the nodes taken
 * alternately from either end (0, n−1, 1, n−2, ...), a hinge's extra rotation
 * beside its node, so that every element, the closing one included, joins
 * places at most a few apart and the envelope stays a narrow band.
 */
function numbering(n: number, hinges: readonly number[]) {
  const endRotation = Array.from({ length: n }, (_, j) => 3 * j + 2);
  hinges.forEach((j, h) => (endRotation[j] = 3 * n + h));
  const size = 3 * n + hinges.length;
  const place = new Int32Array(size);
  let next = 0;
  for (let k = 0; k < n; k++) {
    const node = k % 2 === 0 ? k / 2 : n - 1 - (k - 1) / 2;
    for (let d = 0; d < 3; d++) place[3 * node + d] = next++;
    if (endRotation[node] !== 3 * node + 2) place[endRotation[node]] = next++;
  }
  /** The element's six degrees of freedom: its start node's own, then its end node's with the end rotation. */
  const dofs = (i: number): number[] => {
    const j = (i + 1) % n;
    return [3 * i, 3 * i + 1, 3 * i + 2, 3 * j, 3 * j + 1, endRotation[j]];
  };
  return { size, place, dofs };
}

export function solveRingFrame(f: RingFrame): RingSolution {
  const n = f.nodes.length;
  if (n < 3) throw new Error('a ring needs at least three nodes');
  const hinges = [...new Set(f.hinges ?? [])];
  const { size, place, dofs } = numbering(n, hinges);
  const elements = elementsOf(f);
  const pairs: [number, number][] = [];
  elements.forEach((_, i) => {
    const d = dofs(i);
    for (const a of d) for (const b of d) if (a >= b) pairs.push([a, b]);
  });
  const K = new SkylineCholesky(size, pairs, place);
  elements.forEach((e, i) => {
    const k = globalStiffness(e);
    const d = dofs(i);
    for (let r = 0; r < 6; r++) for (let c = 0; c <= r; c++) K.add(d[r], d[c], k[r][c]);
  });
  for (const s of f.springs) {
    const [ex, ey] = directionAt(f.nodes[s.node], s.direction);
    const b = 3 * s.node;
    K.add(b, b, s.k * ex * ex);
    K.add(b + 1, b + 1, s.k * ey * ey);
    K.add(b + 1, b, s.k * ex * ey);
  }
  const strutBlocks = (f.struts ?? []).map((t) => {
    // The strut as a beam from the node to its fixed inner end, no axial stiffness: its node block only.
    const th = f.nodes[t.node];
    const r2 = f.radius - t.length;
    const k = globalStiffness({ x1: f.radius * Math.sin(th), y1: -f.radius * Math.cos(th), x2: r2 * Math.sin(th), y2: -r2 * Math.cos(th), EA: 0, EI: t.EI });
    const d = [3 * t.node, 3 * t.node + 1, 3 * t.node + 2];
    for (let r = 0; r < 3; r++) for (let c = 0; c <= r; c++) K.add(d[r], d[c], k[r][c]);
    return { k, d };
  });
  const load = new Float64Array(size);
  for (const l of f.loads) {
    const [rx, ry] = directionAt(f.nodes[l.node], 'radial');
    const [tx, ty] = directionAt(f.nodes[l.node], 'tangential');
    load[3 * l.node] += l.radial * rx + l.tangential * tx;
    load[3 * l.node + 1] += l.radial * ry + l.tangential * ty;
  }
  // An even pressure as its statically equivalent end forces, half of q·L at
  // each end of each element along its inward normal: a closed polygon's
  // normals sum to zero, so the pressure stays exactly in balance.
  const q = f.pressure ?? 0;
  if (q !== 0) {
    elements.forEach((e, i) => {
      const j = (i + 1) % n;
      // Walking counter-clockwise, the inward normal is the left-hand one: (−dy, dx)/L, so q·L/2 times it is q/2·(−dy, dx).
      const fx = (-q * (e.y2 - e.y1)) / 2;
      const fy = (q * (e.x2 - e.x1)) / 2;
      load[3 * i] += fx;
      load[3 * i + 1] += fy;
      load[3 * j] += fx;
      load[3 * j + 1] += fy;
    });
  }
  if (!K.factor()) throw new RingNotHeld();
  const u = K.solve(load);
  const forces = elements.map((e, i): RingElementForces => {
    const ue = dofs(i).map((d) => u[d]);
    const r = endForces(e, ue);
    // Walking counter-clockwise, an element's right-hand side is the ring's outer face.
    return { N: r.N, V: r.V, M1: -r.M1, M2: -r.M2 };
  });
  const moment = f.nodes.map((_, j) => (forces[(j - 1 + n) % n].M2 + forces[j].M1) / 2);
  const springStretch = f.springs.map((s) => {
    const [ex, ey] = directionAt(f.nodes[s.node], s.direction);
    return u[3 * s.node] * ex + u[3 * s.node + 1] * ey;
  });
  const strutForce = strutBlocks.map(({ k, d }) => Math.hypot(...[0, 1].map((r) => d.reduce((acc, dof, c) => acc + k[r][c] * u[dof], 0))));
  return { u, elements: forces, moment, springStretch, strutForce };
}
