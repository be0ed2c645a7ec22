import { param } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';

// The partial and combination factors of EN 1990 the checks combine their
// actions with (design basis, section 2), read once from
// rules/parameters/combinations.yaml.

export interface CombinationFactors {
  /** Fundamental combination (6.10, Table A1.2(B)). */
  gammaGsup: number;
  gammaGinf: number;
  gammaQ: number;
  /** The crew's weight accompanying another leading variable action. */
  psi0Crew: number;
  /** Other accompanying variable actions. */
  psi0: number;
  /** Equilibrium (EQU, Table A1.2(A)). */
  gammaGdst: number;
  gammaGstb: number;
  gammaQdst: number;
  /** The material factor in an accidental combination (6.11). */
  gammaMaccidental: number;
  sources: string[];
}

export const COMBINATION_PARAMS = ['gamma_G_sup', 'gamma_G_inf', 'gamma_Q', 'psi_0_crew', 'psi_0', 'gamma_G_dst', 'gamma_G_stb', 'gamma_Q_dst', 'gamma_M_accidental'].map((n) => `combinations.${n}` as const);

export function combinationFactors(data: RulesData): CombinationFactors {
  const p = (n: string) => param(data, 'combinations', n);
  const names = ['gamma_G_sup', 'gamma_G_inf', 'gamma_Q', 'psi_0_crew', 'psi_0', 'gamma_G_dst', 'gamma_G_stb', 'gamma_Q_dst', 'gamma_M_accidental'];
  return {
    gammaGsup: p('gamma_G_sup').value,
    gammaGinf: p('gamma_G_inf').value,
    gammaQ: p('gamma_Q').value,
    psi0Crew: p('psi_0_crew').value,
    psi0: p('psi_0').value,
    gammaGdst: p('gamma_G_dst').value,
    gammaGstb: p('gamma_G_stb').value,
    gammaQdst: p('gamma_Q_dst').value,
    gammaMaccidental: p('gamma_M_accidental').value,
    sources: [...new Set(names.flatMap((n) => p(n).sources))],
  };
}
