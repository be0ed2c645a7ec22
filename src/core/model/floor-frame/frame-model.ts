import type { Rail } from '../cable-net/outline.ts';
import { SkylineCholesky } from '../cable-net/skyline.ts';
import { elementForces, elementStiffness, type ElementForces, type ElementGeometry, type Section } from './frame-element.ts';
import { frameLoop, type FrameLoop, type LoopMark, type LoopShape } from './frame-loop.ts';

// The floor frame bending in its own plane under the straps' pulls: a closed
// loop of beam elements (frame-loop.ts), free in the plane, loaded only by
// self-balancing pairs (each strap pulls its two ends towards each other) and
// tied across by the lashed parts beneath (struts, frame-struts.ts). Three
// displacements are held to remove the rigid-body motion; under balanced
// loads they carry nothing, and a strap's shortening does not depend on them.
// Units: mm, N, N·mm.

/** One strap end on the frame: where, and which way is inwards along its strap. */
export interface FrameAnchor extends LoopMark {
  dir: 'x' | 'y';
  /** +1 where inwards is +dir (the rear and right ends), −1 where it is −dir. */
  inward: 1 | -1;
}

/** A lashed part crossing under the floor: a spring between two rail points along its own axis. */
export interface FrameStrut {
  part: 'pole' | 'axle';
  ends: [LoopMark, LoopMark];
  dir: 'x' | 'y';
  /** Spring stiffness between the two rail points, N/mm. */
  stiffness_N_per_mm: number;
}

export interface FrameInput {
  shape: LoopShape;
  section: Section;
  anchors: FrameAnchor[];
  /** Each strap's two anchors, by index into `anchors`. */
  straps: [number, number][];
  struts: FrameStrut[];
}

export interface RailMoment {
  rail: Rail;
  /** Largest bending moment in plan along the rail, N·mm (magnitude). */
  M_Nmm: number;
  /** Where it is, on the rail's centre line, mm. */
  at: { x: number; y: number };
  /**
   * Axial force at that point, N (tension positive): where two of the rail's elements meet there (a strap's anchor
   * puts a step in the force), the more compressive, the safe side for the check of bending with compression.
   */
  N_N: number;
}

export interface FrameState {
  /** Each strap's shortening from its anchors' inward movement, mm. */
  shortening: Float64Array;
  /** Largest inward movement of any strap end, mm. */
  maxAnchorMove_mm: number;
  rails: RailMoment[];
  /** Force in each strut (compression positive), N. */
  struts: { part: FrameStrut['part']; force_N: number; stiffness_N_per_mm: number }[];
}

const RAILS: readonly Rail[] = ['front', 'rear', 'left', 'right'];

export class FloorFrame {
  readonly loop: FrameLoop;
  readonly input: FrameInput;
  readonly #K: SkylineCholesky;
  /** Global dof of each anchor (its node's u or v). */
  readonly #anchorDof: Int32Array;
  readonly #strutDofs: [number, number][];
  readonly #held: Set<number>;
  #flexibility: Float64Array | undefined;

  constructor(input: FrameInput) {
    this.input = input;
    const marks = [...input.anchors, ...input.struts.flatMap((s) => s.ends)];
    this.loop = frameLoop(input.shape, marks);
    const node = this.loop.markNodes;
    const dofOf = (n: number, dir: 'x' | 'y') => 3 * n + (dir === 'x' ? 0 : 1);
    this.#anchorDof = Int32Array.from(input.anchors, (a, i) => dofOf(node[i], a.dir));
    const base = input.anchors.length;
    this.#strutDofs = input.struts.map((s, i) => [dofOf(node[base + 2 * i], s.dir), dofOf(node[base + 2 * i + 1], s.dir)]);
    // Hold the rear-right corner in both directions and the rear-left corner fore and aft.
    const { rail, width } = input.shape;
    const rearLeft = this.loop.nodes.findIndex((p) => Math.abs(p.x + rail / 2) < 1e-6 && Math.abs(p.y - (width + rail) / 2) < 1e-6);
    this.#held = new Set([0, 1, 3 * rearLeft]);
    const n = 3 * this.loop.nodes.length;
    const pairs: [number, number][] = [];
    for (const e of this.loop.elements) for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) pairs.push([3 * e.a + i, 3 * e.b + j]);
    pairs.push(...this.#strutDofs);
    this.#K = new SkylineCholesky(n, pairs);
    for (const e of this.loop.elements) {
      const k = elementStiffness(this.#geometry(e), input.section);
      const dofs = [3 * e.a, 3 * e.a + 1, 3 * e.a + 2, 3 * e.b, 3 * e.b + 1, 3 * e.b + 2];
      for (let i = 0; i < 6; i++) for (let j = 0; j <= i; j++) this.#addFree(dofs[i], dofs[j], k[i][j]);
    }
    // A strut resists the two rail points' approach: (u_a − u_b) along its axis, the first end the rear or right one.
    input.struts.forEach((s, i) => {
      const [p, q] = this.#strutDofs[i];
      this.#addFree(p, p, s.stiffness_N_per_mm);
      this.#addFree(q, q, s.stiffness_N_per_mm);
      this.#addFree(p, q, -s.stiffness_N_per_mm);
    });
    for (const d of this.#held) this.#K.add(d, d, 1);
    if (!this.#K.factor()) throw new Error('the floor frame loop is not stable in its plane');
  }

  #addFree(i: number, j: number, v: number): void {
    if (!this.#held.has(i) && !this.#held.has(j)) this.#K.add(i, j, v);
  }

  #geometry(e: { a: number; b: number }): ElementGeometry {
    const a = this.loop.nodes[e.a];
    const b = this.loop.nodes[e.b];
    return { x1: a.x, y1: a.y, x2: b.x, y2: b.y };
  }

  /** Nodal loads of the straps pulling their ends inwards with `pulls` (one per strap), N. */
  #loads(pulls: ArrayLike<number>): Float64Array {
    const f = new Float64Array(3 * this.loop.nodes.length);
    this.input.straps.forEach((ends, s) => {
      for (const a of ends) f[this.#anchorDof[a]] += pulls[s] * this.input.anchors[a].inward;
    });
    for (const d of this.#held) f[d] = 0;
    return f;
  }

  #shortening(d: ArrayLike<number>): Float64Array {
    return Float64Array.from(this.input.straps, (ends) => ends.reduce((sum, a) => sum + this.input.anchors[a].inward * d[this.#anchorDof[a]], 0));
  }

  /** F[s][t]: the shortening of strap s under a unit pull of strap t (row-major; symmetric by Maxwell-Betti). */
  flexibility(): Float64Array {
    if (this.#flexibility) return this.#flexibility;
    const { straps, anchors } = this.input;
    const m = straps.length;
    const F = new Float64Array(m * m);
    const f = new Float64Array(3 * this.loop.nodes.length);
    // Each strap's unit pull alone (its two anchor loads),
    // and every strap's shortening read from the displacements.
    for (let t = 0; t < m; t++) {
      f.fill(0);
      for (const a of straps[t]) f[this.#anchorDof[a]] += anchors[a].inward;
      for (const h of this.#held) f[h] = 0;
      // The frame's matrix keeps the loop's own numbering (no reordering): solve in place, the forward sweep from the
      // first loaded row (the rows above it stay zero).
      let from = f.length;
      for (const a of straps[t]) if (f[this.#anchorDof[a]] !== 0) from = Math.min(from, this.#anchorDof[a]);
      this.#K.forward(f, from);
      this.#K.backward(f);
      const d = f;
      for (let s = 0; s < m; s++) {
        const [a, b] = straps[s];
        F[s * m + t] = anchors[a].inward * d[this.#anchorDof[a]] + anchors[b].inward * d[this.#anchorDof[b]];
      }
    }
    this.#flexibility = F;
    return F;
  }

  /** The loop's displacements under the straps' pulls. */
  #displacements(pulls: ArrayLike<number>): Float64Array {
    return this.#K.solve(this.#loads(pulls));
  }

  /** Each loop element's end forces under the straps' pulls, element by element. */
  elementForces(pulls: ArrayLike<number>, d = this.#displacements(pulls)): ElementForces[] {
    const ends = new Float64Array(6);
    return this.loop.elements.map((e) => {
      for (let i = 0; i < 3; i++) {
        ends[i] = d[3 * e.a + i];
        ends[3 + i] = d[3 * e.b + i];
      }
      return elementForces(this.#geometry(e), this.input.section, ends);
    });
  }

  /** The frame under the straps' pulls: shortenings, rail moments and strut forces. */
  solve(pulls: ArrayLike<number>): FrameState {
    const d = this.#displacements(pulls);
    const rails = new Map<Rail, RailMoment>();
    /** The node of each rail's largest moment. */
    const peakNode = new Map<Rail, number>();
    const { elements } = this.loop;
    const forces = this.elementForces(pulls, d);
    elements.forEach((e, k) => {
      const g = this.#geometry(e);
      const f = forces[k];
      const pick = Math.abs(f.M1) >= Math.abs(f.M2) ? { M: f.M1, x: g.x1, y: g.y1, node: e.a } : { M: f.M2, x: g.x2, y: g.y2, node: e.b };
      const cur = rails.get(e.rail);
      if (!cur || Math.abs(pick.M) > cur.M_Nmm) {
        rails.set(e.rail, { rail: e.rail, M_Nmm: Math.abs(pick.M), at: { x: pick.x, y: pick.y }, N_N: f.N });
        peakNode.set(e.rail, pick.node);
      }
    });
    // The moment is the same either side of a node (no moment is applied there), so which element's end was taken
    // is a matter of rounding; the axial force steps at a strap's anchor, so it is taken from both of the rail's
    // elements there (not from another rail's, met at a corner: its force runs the other way).
    elements.forEach((e, k) => {
      const r = rails.get(e.rail);
      const node = peakNode.get(e.rail);
      if (r && (e.a === node || e.b === node)) r.N_N = Math.min(r.N_N, forces[k].N);
    });
    let maxMove = 0;
    for (const a of this.#anchorDof.keys()) maxMove = Math.max(maxMove, this.input.anchors[a].inward * d[this.#anchorDof[a]]);
    return {
      shortening: this.#shortening(d),
      maxAnchorMove_mm: maxMove,
      rails: RAILS.filter((r) => rails.has(r)).map((r) => rails.get(r)!),
      struts: this.input.struts.map((s, i) => ({ part: s.part, force_N: s.stiffness_N_per_mm * (d[this.#strutDofs[i][0]] - d[this.#strutDofs[i][1]]), stiffness_N_per_mm: s.stiffness_N_per_mm })),
    };
  }
}
