// The ring frame's inputs and outputs (ring-frame.ts solves it): a closed
// plane ring of straight beam elements through nodes on a circle of radius R,
// held by springs at some nodes (radial or tangential) and loaded by point
// forces at nodes. The node at angle θ (from the ground contact,
// counter-clockwise) sits at (R·sin θ, −R·cos θ), the hub at the origin.

/** The ring's stiffness matrix is singular: its springs leave part of it free to move (a mechanism). */
export class RingNotHeld extends Error {
  constructor() {
    super('the ring is not held: its springs leave it free to move as a rigid body');
    this.name = 'RingNotHeld';
  }
}

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

/** The ring itself: its nodes, section, hinges and struts (what a set of springs and loads is added to). */
export interface RingShape {
  /** Radius of the nodes, mm. */
  radius: number;
  /** Node angles, ascending in [0, 2π). */
  nodes: readonly number[];
  /** Axial stiffness E·A of the ring's section, N. */
  EA: number;
  /** Bending stiffness E·I of the ring's section, N·mm². */
  EI: number;
  /** Bending struts at nodes (the spokes' resistance to the rim turning and sliding round). */
  struts?: readonly RingStrut[];
  /** Nodes that carry no moment (a joint that can open). */
  hinges?: readonly number[];
}

export interface RingFrame extends RingShape {
  springs: readonly RingSpring[];
  loads: readonly RingLoad[];
  /** An even pressure on the ring's outer face, inward, N per mm of element (optional). */
  pressure?: number;
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
