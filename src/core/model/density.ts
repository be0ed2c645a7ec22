// Timber density at a moisture content (mechanics note, section 1).
//
// The Wood Handbook (FPL-GTR-190, 2010, chapter 4) relation
// G_M = G_b / (1 - 0.265*a*G_b) stands in for a species' volumetric shrinkage
// by 26.5 % x G_b. Where the handbook lists both the basic specific gravity
// G_b and the value at 12 %, the species' own shrinkage is known exactly at
// 12 %: s_12 = 1 - G_b/G_12. Shrinkage below fibre saturation is linear in
// moisture (same chapter), so s(M) = s_12*(30 - M)/18 and G_M = G_b/(1 - s(M)).
// This reproduces both table columns and serves woods, such as black locust,
// that shrink much less than the relation assumes.

/** Fibre saturation point used by the relations, percent. */
export const FIBRE_SATURATION_PCT = 30;

/** The handbook relation: SG at moisture M (volume at M) from basic SG alone. */
export function handbookSpecificGravity(Gb: number, M: number): number {
  if (M >= FIBRE_SATURATION_PCT) return Gb;
  const a = (FIBRE_SATURATION_PCT - M) / FIBRE_SATURATION_PCT;
  return Gb / (1 - 0.265 * a * Gb);
}

/** SG at moisture M from the two handbook columns, green (basic) and 12 %. */
export function specificGravityAt(Gb: number, G12: number, M: number): number {
  if (M >= FIBRE_SATURATION_PCT) return Gb;
  const s12 = 1 - Gb / G12;
  const s = (s12 * (FIBRE_SATURATION_PCT - M)) / (FIBRE_SATURATION_PCT - 12);
  return Gb / (1 - s);
}

/** Density in kg/m^3 at moisture M: the wood and its water over the volume at M. */
export function densityFromSG(GM: number, M: number): number {
  return 1000 * GM * (1 + M / 100);
}
