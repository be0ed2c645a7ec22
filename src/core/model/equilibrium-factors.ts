import type { CombinationFactors } from './combination-factors.ts';
import type { PartMass } from './part-mass.ts';

// The EQU set applied to the yoke's balance (design basis, section 2): about
// the wheels' contact, a weight ahead of the axle presses the yoke down
// (stabilising), one behind lifts it (destabilising). Permanent weights take
// 1.1 where they destabilise and 0.9 where they stabilise; the crew and
// loads take 1.5 where they destabilise and are left out where they help.

export function equilibriumWeight(p: PartMass, axleX_mm: number, f: CombinationFactors): number {
  const helps = p.x_mm >= axleX_mm;
  if (p.variable) return helps ? 0 : f.gammaQdst;
  return helps ? f.gammaGstb : f.gammaGdst;
}
