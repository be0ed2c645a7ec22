// The instability factor of a timber strut (EN 1995-1-1 section 6.3.2,
// equations 6.25 to 6.29; design basis, section 6). It carries the member's
// initial bow (straightness within L/300 for solid timber) through beta_c, so
// the Euler load needs no further margin.

/** k = 0.5·(1 + β_c·(λ_rel − λ_rel,0) + λ_rel²). */
export function instabilityK(lambdaRel: number, betaC: number, threshold: number): number {
  return 0.5 * (1 + betaC * (lambdaRel - threshold) + lambdaRel ** 2);
}

/** k_c = 1/(k + √(k² − λ_rel²)); 1 up to the threshold slenderness. */
export function bucklingFactor(lambdaRel: number, betaC: number, threshold: number): number {
  if (lambdaRel <= threshold) return 1;
  const k = instabilityK(lambdaRel, betaC, threshold);
  return 1 / (k + Math.sqrt(k * k - lambdaRel ** 2));
}
