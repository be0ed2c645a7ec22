import { instabilityK } from '../../model/timber/buckling-factor.ts';
import { num, step } from '../../pipeline/step.ts';

/** The instability factor worked: k and k_c beyond the threshold slenderness, else k_c = 1. */
export function bucklingFactorSteps(lambdaRel: number, betaC: number, threshold: number, kc: number) {
  if (lambdaRel <= threshold) return [step('λ_rel ≤ λ_rel,0: no reduction, k_c', `${num(lambdaRel)} ≤ ${num(threshold)}`, kc, '1')];
  const k = instabilityK(lambdaRel, betaC, threshold);
  return [
    step('k = 0.5·(1 + β_c·(λ_rel − λ_rel,0) + λ_rel²)', `0.5 × (1 + ${num(betaC)} × (${num(lambdaRel)} − ${num(threshold)}) + ${num(lambdaRel)}²)`, k, '1'),
    step('k_c = 1/(k + √(k² − λ_rel²))', `1/(${num(k)} + √(${num(k)}² − ${num(lambdaRel)}²))`, kc, '1'),
  ];
}
