import type { Rule } from '../../engine/rule.ts';
import { eulerLoad } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { stiffness05, timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { kModBasis, memberFinding, type CaseCheck } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

/** EN 1995-1-1 section 6.3.2: k_c from the relative slenderness. */
export function bucklingFactor(lambdaRel: number, betaC: number, threshold: number): number {
  if (lambdaRel <= threshold) return 1;
  const k = 0.5 * (1 + betaC * (lambdaRel - threshold) + lambdaRel ** 2);
  return 1 / (k + Math.sqrt(k * k - lambdaRel ** 2));
}

export const spokeMember: Rule = {
  id: 'member.spoke',
  title: 'Spoke crushing and buckling',
  checks: 'The spoke under the nave carries the whole wheel load in compression: crushing along the grain, and buckling over its free length between nave and felloe, in every load case.',
  kind: 'check',
  limits: ['utilisation_max', 'effective_length_factor', 'straightness_factor', 'slenderness_threshold'],
  run(ctx) {
    const { spec, data } = ctx;
    const M = spec.moisture_content_pct;
    const part = timberPart(spec, 'spoke');
    const compression = timberStrength(data, part, 'compression', M);
    const E = stiffness05(data, part, M);
    const S = rectangle(spec.wheels.spoke.width_mm, spec.wheels.spoke.thickness_mm);
    const L = ctx.analysis.mass.layout.spokeLength;
    const K = ctx.limit('effective_length_factor');
    const beta = ctx.limit('straightness_factor');
    const lim0 = ctx.limit('slenderness_threshold');
    const Ncr = eulerLoad(E.fk, S.Imin, L, K.value);
    // The clear-wood f_k (not reduced for the grade) in the slenderness: the modulus is
    // clear-wood too, and the larger λ_rel is the safe side.
    const lambdaRel = Math.sqrt((compression.characteristic.fk * S.area) / Ncr);
    const kc = bucklingFactor(lambdaRel, beta.value, lim0.value);
    const umax = ctx.limit('utilisation_max');
    const crush: CaseCheck[] = [];
    const buckle: CaseCheck[] = [];
    for (const c of ctx.analysis.memberCases) {
      const fc = compression.design(c.duration);
      const sigma = c.wheel_N / S.area;
      const basis = kModBasis(fc.kMod, c.duration);
      crush.push({ memberCase: c, mode: 'crushing along the grain', demand: sigma, capacity: fc.value, basis, sources: [fc.kModSource], line: `σ_c = N_w/A = ${f(c.wheel_N, 1)} / ${f(S.area, 0)} = ${f(sigma)} MPa; ${fc.line}` });
      const Nb = kc * fc.value * S.area;
      buckle.push({ memberCase: c, mode: 'buckling', demand: c.wheel_N, capacity: Nb, basis, sources: [fc.kModSource], line: `N_b = k_c·f_c,d·A = ${f(kc, 3)} × ${f(fc.value)} × ${f(S.area, 0)} = ${f(Nb, 0)} N against N_w = ${f(c.wheel_N, 0)} N` });
    }
    const section = `${S.label} (width × thickness), A = ${f(S.area, 0)} mm²`;
    const bIntro = [
      `free length L = felloe inner radius − nave radius = ${f(L, 1)} mm; ${section}, I_min = ${f(S.Imin, 0)} mm⁴`,
      ...compression.working,
      ...E.working,
      `Euler load N_cr = π²·E_0.05·I_min/(K·L)² = π² × ${f(E.fk, 0)} × ${f(S.Imin, 0)} / (${K.value} × ${f(L, 1)})² = ${f(Ncr, 0)} N`,
      `relative slenderness λ_rel = √(f_c,0,k·A / N_cr) = √(${f(compression.characteristic.fk)} × ${f(S.area, 0)} / ${f(Ncr, 0)}) = ${f(lambdaRel, 3)} (clear-wood f_k, the larger λ_rel)`,
      lambdaRel <= lim0.value
        ? `λ_rel ≤ ${lim0.value}: no reduction, k_c = 1`
        : `k = 0.5·(1 + β_c·(λ_rel − ${lim0.value}) + λ_rel²) with β_c = ${beta.value}; k_c = 1/(k + √(k² − λ_rel²)) = ${f(kc, 3)} (EN 1995-1-1 section 6.3.2)`,
    ];
    const fixCrush = 'Use a larger spoke section, a stronger species, or selected straight-grained stock (set its grade).';
    return [
      memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks: crush, umax, intro: [section, ...compression.working], sources: compression.sources, fix: fixCrush }),
      memberFinding({ rule: this.id, part: part.label, unit: 'N', checks: buckle, umax, intro: bIntro, sources: [...compression.sources, ...E.sources, K.source, beta.source, lim0.source], fix: 'Thicken the spoke in its thinner direction (buckling resistance rises with the cube of it), or shorten it with a larger nave or deeper felloe.' }),
    ];
  },
};
