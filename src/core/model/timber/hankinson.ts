// Strength (or stiffness) at an angle theta to the grain, Hankinson's formula
// (Wood Handbook FPL-GTR-190, chapter 5, slope of grain):
//   f_theta = f_par f_perp / (f_par sin^n(theta) + f_perp cos^n(theta))

export function hankinson(fPar: number, fPerp: number, thetaRad: number, n: number): number {
  const s = Math.abs(Math.sin(thetaRad)) ** n;
  const c = Math.abs(Math.cos(thetaRad)) ** n;
  return (fPar * fPerp) / (fPar * s + fPerp * c);
}
