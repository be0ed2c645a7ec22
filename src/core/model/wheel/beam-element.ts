// A straight plane frame element (Euler-Bernoulli beam with axial stiffness)
// for the direct stiffness method: 3 degrees of freedom at each end (u, v,
// rotation). The stiffness is the textbook one (e.g. Przemieniecki, Theory of
// Matrix Structural Analysis, the plane frame element); it is checked through
// the ring it builds against the closed form of a thin ring (tests/wheel).

export interface BeamElement {
  /** Start and end points, mm. */
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Axial stiffness E·A, N. */
  EA: number;
  /** Bending stiffness E·I, N·mm². */
  EI: number;
}

/** Internal forces at the element's two ends, in its own axes. */
export interface EndForces {
  /** Axial force, tension positive, N (the same at both ends: no load along the element). */
  N: number;
  /** Shear force, N (the same at both ends). */
  V: number;
  /**
   * Bending moment at the start and the end, N·mm, positive where the fibre
   * on the element's right-hand side (looking from start to end) is in tension.
   */
  M1: number;
  M2: number;
}

function geometry(e: BeamElement) {
  const dx = e.x2 - e.x1;
  const dy = e.y2 - e.y1;
  const L = Math.hypot(dx, dy);
  return { L, c: dx / L, s: dy / L };
}

/** The element's stiffness in global axes (6 × 6): Tᵀ·k·T written out, T the rotation by the element's direction (c, s). */
export function globalStiffness(e: BeamElement): number[][] {
  const { L, c, s } = geometry(e);
  const a = e.EA / L;
  const b = (12 * e.EI) / L ** 3;
  const A = a * c * c + b * s * s;
  const B = (a - b) * c * s;
  const D = a * s * s + b * c * c;
  const C = ((6 * e.EI) / L ** 2) * s;
  const E = ((6 * e.EI) / L ** 2) * c;
  const F = (4 * e.EI) / L;
  const G = (2 * e.EI) / L;
  return [
    [A, B, -C, -A, -B, -C],
    [B, D, E, -B, -D, E],
    [-C, E, F, C, -E, G],
    [-A, -B, C, A, B, C],
    [-B, -D, -E, B, D, -E],
    [-C, E, G, C, -E, F],
  ];
}

/**
 * The element's internal forces from its end displacements in global axes
 * [u1, v1, θ1, u2, v2, θ2], read as u[dofs[at + k]] (the identity where no
 * numbering is given). The rows of the local stiffness k·u_local it needs,
 * written out term by term in the order of the 6 × 6 product, zeros included,
 * so the sums are the product's to the last bit; a ring solve takes this for
 * every element, so nothing is allocated but the answer.
 */
export function endForces(e: BeamElement, u: ArrayLike<number>, dofs?: ArrayLike<number>, at = 0): EndForces {
  const { L, c, s } = geometry(e);
  const a = e.EA / L;
  const b = (12 * e.EI) / L ** 3;
  const cc = (6 * e.EI) / L ** 2;
  const d = (4 * e.EI) / L;
  const h = (2 * e.EI) / L;
  const g0 = u[dofs ? dofs[at] : 0], g1 = u[dofs ? dofs[at + 1] : 1], g2 = u[dofs ? dofs[at + 2] : 2];
  const g3 = u[dofs ? dofs[at + 3] : 3], g4 = u[dofs ? dofs[at + 4] : 4], g5 = u[dofs ? dofs[at + 5] : 5];
  // Displacements in the element's own axes.
  const u0 = c * g0 + s * g1;
  const u1 = -s * g0 + c * g1;
  const u2 = g2;
  const u3 = c * g3 + s * g4;
  const u4 = -s * g3 + c * g4;
  const u5 = g5;
  // Rows 1, 2, 3 and 5 of k: [0, b, c, 0, −b, c], [0, c, d, 0, −c, h], [−a, 0, 0, a, 0, 0], [0, c, h, 0, −c, d].
  const f1 = 0 + 0 * u0 + b * u1 + cc * u2 + 0 * u3 + -b * u4 + cc * u5;
  const f2 = 0 + 0 * u0 + cc * u1 + d * u2 + 0 * u3 + -cc * u4 + h * u5;
  const f3 = 0 + -a * u0 + 0 * u1 + 0 * u2 + a * u3 + 0 * u4 + 0 * u5;
  const f5 = 0 + 0 * u0 + cc * u1 + h * u2 + 0 * u3 + -cc * u4 + d * u5;
  // f holds the forces the nodes put on the element. Tension pulls the end
  // node's force along +x; the end moment f[5] is sagging (tension on the -y,
  // right-hand side) and the start moment f[2] hogging.
  return { N: f3, V: f1, M1: -f2, M2: f5 };
}
