// A straight plane frame element (Euler-Bernoulli: axial, shear-rigid
// bending): its stiffness in global axes and its end forces. The standard
// 6 × 6 element (e.g. Przemieniecki, Theory of Matrix Structural Analysis,
// ch. 5; or any matrix structural analysis text). Dofs per node: u, v, θ.

export interface ElementGeometry {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export interface Section {
  EA: number;
  EI: number;
}

/** The distinct entries of the local stiffness: EA/L, 12EI/L³, 6EI/L², 4EI/L, 2EI/L. */
function localTerms(L: number, s: Section): { a: number; b: number; c: number; d: number; e: number } {
  return { a: s.EA / L, b: (12 * s.EI) / L ** 3, c: (6 * s.EI) / L ** 2, d: (4 * s.EI) / L, e: (2 * s.EI) / L };
}

function local(L: number, s: Section): number[][] {
  const { a, b, c, d, e } = localTerms(L, s);
  return [
    [a, 0, 0, -a, 0, 0],
    [0, b, c, 0, -b, c],
    [0, c, d, 0, -c, e],
    [-a, 0, 0, a, 0, 0],
    [0, -b, -c, 0, b, -c],
    [0, c, e, 0, -c, d],
  ];
}

/** Rotation from global to the element's axes (x' along a → b). */
function rotation(g: ElementGeometry): { L: number; c: number; s: number } {
  const dx = g.x2 - g.x1;
  const dy = g.y2 - g.y1;
  const L = Math.hypot(dx, dy);
  return { L, c: dx / L, s: dy / L };
}

/** The element's 6 × 6 stiffness in global axes. */
export function elementStiffness(g: ElementGeometry, sec: Section): number[][] {
  const { L, c, s } = rotation(g);
  const k = local(L, sec);
  // K = Tᵀ k T, T block-diagonal with [[c, s, 0], [−s, c, 0], [0, 0, 1]].
  const T = [
    [c, s, 0, 0, 0, 0],
    [-s, c, 0, 0, 0, 0],
    [0, 0, 1, 0, 0, 0],
    [0, 0, 0, c, s, 0],
    [0, 0, 0, -s, c, 0],
    [0, 0, 0, 0, 0, 1],
  ];
  // Plain loops: this runs for every element of every frame built.
  const kT = k.map((row) => {
    const out = [0, 0, 0, 0, 0, 0];
    for (let j = 0; j < 6; j++) for (let m = 0; m < 6; m++) out[j] += row[m] * T[m][j];
    return out;
  });
  const K = T.map(() => [0, 0, 0, 0, 0, 0]);
  for (let i = 0; i < 6; i++) for (let j = 0; j < 6; j++) for (let m = 0; m < 6; m++) K[i][j] += T[m][i] * kT[m][j];
  return K;
}

export interface ElementForces {
  /** Axial force, N (tension positive). */
  N: number;
  /** Bending moment at each end, N·mm (one sign convention along the loop: sagging towards the element's left). */
  M1: number;
  M2: number;
  /** Shear force, N. */
  V: number;
  length: number;
}

/**
 * End forces from the element's global end displacements [u1, v1, θ1, u2, v2, θ2]. Each force is the row of the local
 * stiffness times the local displacements, written out term by term in the row's order, zeros included, so every sum
 * is the matrix product's to the last bit; nothing is allocated but the result (it runs for every element of every
 * floor state).
 */
export function elementForces(g: ElementGeometry, sec: Section, d: ArrayLike<number>): ElementForces {
  const { L, c, s } = rotation(g);
  const { a, b, c: k, d: m, e } = localTerms(L, sec);
  // The end displacements in the element's axes.
  const l0 = c * d[0] + s * d[1], l1 = -s * d[0] + c * d[1], l2 = d[2], l3 = c * d[3] + s * d[4], l4 = -s * d[3] + c * d[4], l5 = d[5];
  const f1 = 0 + 0 * l0 + b * l1 + k * l2 + 0 * l3 + -b * l4 + k * l5;
  const f2 = 0 + 0 * l0 + k * l1 + m * l2 + 0 * l3 + -k * l4 + e * l5;
  const f3 = 0 + -a * l0 + 0 * l1 + 0 * l2 + a * l3 + 0 * l4 + 0 * l5;
  const f5 = 0 + 0 * l0 + k * l1 + e * l2 + 0 * l3 + -k * l4 + m * l5;
  // The internal moment is −f₃ at the first end and +f₆ at the second (end moments act on the element).
  return { N: f3, M1: -f2, M2: f5, V: f1, length: L };
}
