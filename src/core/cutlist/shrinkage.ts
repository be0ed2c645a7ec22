import { FIBRE_SATURATION_PCT } from '../model/density.ts';

// Shrinkage from green to a moisture content (Wood Handbook, FPL-GTR-190,
// chapter 4; mechanics note, section 1): below fibre saturation shrinkage is
// linear in moisture, S_M = S_0 (30 - M)/30, S_0 the total shrinkage green to
// oven-dry in %. A part that must measure d at M is cut green at d/(1 - S_M/100).

/** Shrinkage green to moisture M, % of the green dimension. */
export function shrinkageTo(S0pct: number, M: number): number {
  if (M >= FIBRE_SATURATION_PCT) return 0;
  return (S0pct * (FIBRE_SATURATION_PCT - M)) / FIBRE_SATURATION_PCT;
}

/** The green size that dries to d at moisture M. */
export function greenSize(d: number, S0pct: number, M: number): number {
  return d / (1 - shrinkageTo(S0pct, M) / 100);
}
