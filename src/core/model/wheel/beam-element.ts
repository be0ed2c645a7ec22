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

/** The element's stiffness in its own axes (6 × 6, row-major). */
function localStiffness(EA: number, EI: number, L: number): number[][] {
  const a = EA / L;
  const b = (12 * EI) / L ** 3;
  const c = (6 * EI) / L ** 2;
  const d = (4 * EI) / L;
  const h = (2 * EI) / L;
  return [
    [a, 0, 0, -a, 0, 0],
    [0, b, c, 0, -b, c],
    [0, c, d, 0, -c, h],
    [-a, 0, 0, a, 0, 0],
    [0, -b, -c, 0, b, -c],
    [0, c, h, 0, -c, d],
  ];
}

/** Global end displacements to the element's own axes. */
function toLocal(u: ArrayLike<number>, c: number, s: number): number[] {
  return [c * u[0] + s * u[1], -s * u[0] + c * u[1], u[2], c * u[3] + s * u[4], -s * u[3] + c * u[4], u[5]];
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

/** The element's internal forces from its end displacements in global axes [u1, v1, θ1, u2, v2, θ2]. */
export function endForces(e: BeamElement, u: ArrayLike<number>): EndForces {
  const { L, c, s } = geometry(e);
  const k = localStiffness(e.EA, e.EI, L);
  const ul = toLocal(u, c, s);
  const f = k.map((row) => row.reduce((acc, v, j) => acc + v * ul[j], 0));
  // f holds the forces the nodes put on the element. Tension pulls the end
  // node's force along +x; the end moment f[5] is sagging (tension on the -y,
  // right-hand side) and the start moment f[2] hogging.
  return { N: f[3], V: f[1], M1: -f[2], M2: f[5] };
}
