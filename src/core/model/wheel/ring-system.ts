import { BandCholesky } from './band-cholesky.ts';
import { endForces, globalStiffness, type BeamElement } from './beam-element.ts';
import { directionAt, RingNotHeld, type RingElementForces, type RingLoad, type RingShape, type RingSolution, type RingSpring } from './ring-frame-types.ts';

// A ring's stiffness assembled once: its elements' matrices, the numbering,
// the band and the struts, which do not change while the springs (the spokes
// that bear) and the loads do. Each set of springs then costs a copy of the
// band, a few entries and a factor; each load a solve. A hinge node passes
// force but no moment: the element ending there turns on a rotation of its own.

/**
 * Degree-of-freedom numbering: x, y, rotation of each node (3j, 3j+1, 3j+2),
 * and past them one more rotation per hinge, the end rotation of the element
 * that ends at the hinge. `place` is the stored order: the nodes taken
 * alternately from either end (0, n−1, 1, n−2, ...), a hinge's extra rotation
 * beside its node, so that every element, the closing one included, joins
 * places at most a few apart and the band stays narrow.
 */
function numbering(n: number, hinges: readonly number[]) {
  const endRotation = Int32Array.from({ length: n }, (_, j) => 3 * j + 2);
  hinges.forEach((j, h) => (endRotation[j] = 3 * n + h));
  const size = 3 * n + hinges.length;
  const place = new Int32Array(size);
  let next = 0;
  for (let k = 0; k < n; k++) {
    const node = k % 2 === 0 ? k / 2 : n - 1 - (k - 1) / 2;
    for (let d = 0; d < 3; d++) place[3 * node + d] = next++;
    if (endRotation[node] !== 3 * node + 2) place[endRotation[node]] = next++;
  }
  /** Each element's six degrees of freedom: its start node's own, then its end node's with the end rotation. */
  const dofs = new Int32Array(6 * n);
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const o = 6 * i;
    dofs[o] = 3 * i;
    dofs[o + 1] = 3 * i + 1;
    dofs[o + 2] = 3 * i + 2;
    dofs[o + 3] = 3 * j;
    dofs[o + 4] = 3 * j + 1;
    dofs[o + 5] = endRotation[j];
  }
  return { size, place, dofs };
}

/** The widest reach of any element's entries from the diagonal, in stored places. */
function bandWidth(place: Int32Array, dofs: Int32Array): number {
  let w = 2; // a node's own block (a spring or a strut)
  for (let e = 0; e < dofs.length; e += 6) {
    let lo = Infinity;
    let hi = -Infinity;
    for (let d = e; d < e + 6; d++) {
      lo = Math.min(lo, place[dofs[d]]);
      hi = Math.max(hi, place[dofs[d]]);
    }
    w = Math.max(w, hi - lo);
  }
  return w;
}

export class RingSystem {
  readonly shape: RingShape;
  readonly size: number;
  readonly #elements: BeamElement[];
  readonly #dofs: Int32Array;
  /** The elements and struts assembled, unfactored. */
  readonly #base: BandCholesky;
  readonly #struts: { k: number[][]; node: number }[];

  constructor(shape: RingShape) {
    const n = shape.nodes.length;
    if (n < 3) throw new Error('a ring needs at least three nodes');
    this.shape = shape;
    const { size, place, dofs } = numbering(n, [...new Set(shape.hinges ?? [])]);
    this.size = size;
    this.#dofs = dofs;
    const x = shape.nodes.map((t) => shape.radius * Math.sin(t));
    const y = shape.nodes.map((t) => -shape.radius * Math.cos(t));
    this.#elements = shape.nodes.map((_, i) => ({ x1: x[i], y1: y[i], x2: x[(i + 1) % n], y2: y[(i + 1) % n], EA: shape.EA, EI: shape.EI }));
    const K = new BandCholesky(size, bandWidth(place, dofs), place);
    this.#elements.forEach((e, i) => {
      const k = globalStiffness(e);
      for (let r = 0; r < 6; r++) for (let c = 0; c <= r; c++) K.add(dofs[6 * i + r], dofs[6 * i + c], k[r][c]);
    });
    this.#struts = (shape.struts ?? []).map((t) => {
      // The strut as a beam from the node to its fixed inner end, no axial stiffness: its node block only.
      const th = shape.nodes[t.node];
      const r2 = shape.radius - t.length;
      const k = globalStiffness({ x1: x[t.node], y1: y[t.node], x2: r2 * Math.sin(th), y2: -r2 * Math.cos(th), EA: 0, EI: t.EI });
      for (let r = 0; r < 3; r++) for (let c = 0; c <= r; c++) K.add(3 * t.node + r, 3 * t.node + c, k[r][c]);
      return { k, node: t.node };
    });
    this.#base = K;
  }

  /** The ring with these springs added, factored; throws RingNotHeld where they leave it free to move. */
  factorWith(springs: readonly RingSpring[]): BandCholesky {
    const K = this.#base.copy();
    for (const s of springs) {
      const [ex, ey] = directionAt(this.shape.nodes[s.node], s.direction);
      const b = 3 * s.node;
      K.add(b, b, s.k * ex * ex);
      K.add(b + 1, b + 1, s.k * ey * ey);
      K.add(b + 1, b, s.k * ex * ey);
    }
    if (!K.factor()) throw new RingNotHeld();
    return K;
  }

  /** Point loads, and an even pressure on the outer face (N per mm, inward), as a load vector. */
  loadVector(loads: readonly RingLoad[], pressure = 0): Float64Array {
    const nodes = this.shape.nodes;
    const load = new Float64Array(this.size);
    for (const l of loads) {
      const [rx, ry] = directionAt(nodes[l.node], 'radial');
      const [tx, ty] = directionAt(nodes[l.node], 'tangential');
      load[3 * l.node] += l.radial * rx + l.tangential * tx;
      load[3 * l.node + 1] += l.radial * ry + l.tangential * ty;
    }
    // An even pressure as its statically equivalent end forces, half of q·L at
    // each end of each element along its inward normal: a closed polygon's
    // normals sum to zero, so the pressure stays exactly in balance.
    if (pressure !== 0) {
      const n = nodes.length;
      this.#elements.forEach((e, i) => {
        const j = (i + 1) % n;
        // Walking counter-clockwise, the inward normal is the left-hand one: (−dy, dx)/L, so q·L/2 times it is q/2·(−dy, dx).
        const fx = (-pressure * (e.y2 - e.y1)) / 2;
        const fy = (pressure * (e.x2 - e.x1)) / 2;
        load[3 * i] += fx;
        load[3 * i + 1] += fy;
        load[3 * j] += fx;
        load[3 * j + 1] += fy;
      });
    }
    return load;
  }

  /** The forces, moments, spring stretches and strut forces of a displacement `u` of the ring with these springs. */
  solution(u: Float64Array, springs: readonly RingSpring[]): RingSolution {
    const nodes = this.shape.nodes;
    const n = nodes.length;
    const dofs = this.#dofs;
    const forces = this.#elements.map((e, i): RingElementForces => {
      const r = endForces(e, u, dofs, 6 * i);
      // Walking counter-clockwise, an element's right-hand side is the ring's outer face.
      return { N: r.N, V: r.V, M1: -r.M1, M2: -r.M2 };
    });
    const moment = nodes.map((_, j) => (forces[(j - 1 + n) % n].M2 + forces[j].M1) / 2);
    const springStretch = springs.map((s) => {
      const [ex, ey] = directionAt(nodes[s.node], s.direction);
      return u[3 * s.node] * ex + u[3 * s.node + 1] * ey;
    });
    const strutForce = this.#struts.map(({ k, node }) => {
      const d = [3 * node, 3 * node + 1, 3 * node + 2];
      return Math.hypot(...[0, 1].map((r) => d.reduce((acc, dof, c) => acc + k[r][c] * u[dof], 0)));
    });
    return { u, elements: forces, moment, springStretch, strutForce };
  }
}
