// What a lashing of n wraps of a strap b x t can carry (mechanics note,
// section 7). Millimetres and MPa give newtons.

export interface LashingSize {
  wraps: number;
  width_mm: number;
  thickness_mm: number;
}

/** Tensile capacity against the members parting: two strands per wrap, 2 n b t f_t / SF. */
export function tensileCapacity(l: LashingSize, strength_MPa: number, safetyFactor: number): number {
  return (2 * l.wraps * l.width_mm * l.thickness_mm * strength_MPa) / safetyFactor;
}

/**
 * The pull the strands carry: their own pretension until the members part,
 * the joint force shared between the 2n strands after; max(F, 2 n T_pre).
 */
export function strandPull(jointForce_N: number, wraps: number, pretension_N: number): number {
  return Math.max(jointForce_N, 2 * wraps * pretension_N);
}

/** Clamp friction against the members sliding on each other: mu * 2 n T_pre. */
export function slipCapacity(mu: number, wraps: number, pretension_N: number): number {
  return mu * (2 * wraps * pretension_N);
}
