import type { RulesData } from '../../data/rules-data.ts';
import { num } from '../../findings/working.ts';
import { combinationFactors } from '../combination-factors.ts';
import type { CaseFactor } from './floor-model.ts';

// The factor on the crew's weight for the floor in the fundamental combination
// (design basis, section 2). The crew's weight is the floor's only load: the
// straps' own weight is left out and the pretension is an imposed strain,
// taken at its estimate. Standing, the crew's weight leads: γ_Q × Q. Over
// rough ground the dynamic increment (φ − 1) Q leads and the crew's weight
// accompanies it: γ_Q (ψ_0 + φ − 1) Q.

export function designFloorFactor(data: RulesData, rough: CaseFactor | null): CaseFactor {
  const f = combinationFactors(data);
  if (rough === null) return { value: f.gammaQ, source: `fundamental combination, the crew standing: γ_Q = ${num(f.gammaQ)} on their weight` };
  const value = f.gammaQ * (f.psi0Crew + rough.value - 1);
  return {
    value,
    source: `fundamental combination over rough ground: γ_Q·(ψ_0 + φ − 1) = ${num(f.gammaQ)} × (${num(f.psi0Crew)} + ${num(rough.value)} − 1) = ${num(value)} on the crew's weight; φ from ${rough.source}`,
  };
}
