// Timber density at a moisture content, Wood Handbook FPL-GTR-190 (2010),
// chapter 4, as set out in the mechanics note, section 1.

/** Fibre saturation point used by the relation, percent. */
export const FIBRE_SATURATION_PCT = 30;

/** Specific gravity at moisture M (volume at M) from basic specific gravity Gb. */
export function specificGravityAt(Gb: number, M: number): number {
  if (M >= FIBRE_SATURATION_PCT) return Gb;
  const a = (FIBRE_SATURATION_PCT - M) / FIBRE_SATURATION_PCT;
  return Gb / (1 - 0.265 * a * Gb);
}

/** Density in kg/m^3 at moisture M: the wood and its water over volume at M. */
export function densityAt(Gb: number, M: number): number {
  return 1000 * specificGravityAt(Gb, M) * (1 + M / 100);
}
