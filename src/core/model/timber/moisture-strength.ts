// Strength of clear wood at a moisture content M below fibre saturation, from
// its values at 12 % and green (Wood Handbook FPL-GTR-190, chapter 5,
// equation 5-3): P_M = P_12 (P_12 / P_g)^((12 - M) / (M_p - 12)). At and above
// M_p the wood is taken as green.

export function propertyAtMoisture(p12: number, pGreen: number, moisturePct: number, mpPct: number): number {
  if (moisturePct >= mpPct) return pGreen;
  return p12 * (p12 / pGreen) ** ((12 - moisturePct) / (mpPct - 12));
}
