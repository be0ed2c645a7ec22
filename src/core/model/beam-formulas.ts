// Largest bending moment of the standard beam cases and the Euler load of a
// strut (Roark's Formulas for Stress and Strain, Table 8.1; Euler column).
// Consistent units: N and m give N·m.

/** Cantilever of length l with an end load W: M = W l, at the support. */
export function cantileverEndLoadMoment(W: number, l: number): number {
  return W * l;
}

/** Simply supported span l, load W at midspan: M = W l / 4, under the load. */
export function centreLoadMoment(W: number, l: number): number {
  return (W * l) / 4;
}

/** Simply supported span l, uniform load w per unit length: M = w l² / 8, at midspan. */
export function uniformLoadMoment(w: number, l: number): number {
  return (w * l * l) / 8;
}

/** Euler critical load of a straight strut: P_cr = π² E I / (K L)². */
export function eulerLoad(E: number, I: number, L: number, K = 1): number {
  return (Math.PI ** 2 * E * I) / (K * L) ** 2;
}

/**
 * Largest bending moment of a simply supported span l under point loads P_i at
 * a_i (statics: R_A = sum P_i (l - a_i)/l; the moment peaks under a load).
 * Loads outside the span go straight to a support.
 */
export function pointLoadsMaxMoment(l: number, loads: readonly { at: number; P: number }[]): { M: number; at: number } {
  const inside = loads.filter((q) => q.at > 0 && q.at < l).sort((a, b) => a.at - b.at);
  const RA = inside.reduce((s, q) => s + (q.P * (l - q.at)) / l, 0);
  let best = { M: 0, at: 0 };
  let shear = RA;
  let M = 0;
  let x = 0;
  for (const q of inside) {
    M += shear * (q.at - x);
    x = q.at;
    if (M > best.M) best = { M, at: x };
    shear -= q.P;
  }
  return best;
}
