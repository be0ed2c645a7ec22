import type { Rule } from '../../engine/rule.ts';
import { loadFactor } from '../../model/load-factors.ts';
import { poleCantilever, poleEulerLoad, rootMoment } from '../../model/members/pole-cantilever.ts';
import { stiffness05, timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { kModBasis, memberFinding, type CaseCheck } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

export const poleMember: Rule = {
  id: 'member.pole',
  title: 'Pole strength and buckling',
  checks: 'Bending of the pole where it leaves the box, as a cantilever carrying the yoke load and the pull or push along it, and Euler buckling of the pole as a strut under the braking force with a margin.',
  kind: 'check',
  limits: ['utilisation_max', 'effective_length_factor'],
  run(ctx) {
    const { spec, data } = ctx;
    const M = spec.moisture_content_pct;
    const part = timberPart(spec, 'pole');
    const bending = timberStrength(data, part, 'bending', M);
    const compression = timberStrength(data, part, 'compression', M);
    const g = poleCantilever(spec, ctx.analysis.mass.layout);
    const S = g.section;
    const cases = ctx.analysis.memberCases.filter((c) => c.id !== 'turn');
    const checks: CaseCheck[] = cases.map((c) => {
      const fm = bending.design(c.duration);
      const Mr = rootMoment(g, c.pole_N, c.poleAxial_N);
      const sm = Mr / S.W;
      const sa = Math.abs(c.poleAxial_N) / S.area;
      let capacity = fm.value;
      let interaction = '';
      if (c.poleAxial_N > 0) {
        // EN 1995-1-1 eq. 6.19: (σ_c/f_c)² + σ_m/f_m ≤ 1, as the bending strength left.
        const fc = compression.design(c.duration);
        capacity = fm.value * (1 - (sa / fc.value) ** 2);
        interaction = `; compression σ_c = T/A = ${f(sa, 3)} MPa, f_c,d = ${f(fc.value)} MPa: bending strength left f_m,d·(1 − (σ_c/f_c,d)²) = ${f(capacity)} MPa`;
      } else if (c.poleAxial_N < 0) {
        // σ_t/f_t + σ_m/f_m ≤ 1 with f_t taken as f_m (clear wood is stronger in tension than in bending).
        capacity = fm.value - sa;
        interaction = `; tension σ_t = T/A = ${f(sa, 3)} MPa: bending strength left f_m,d − σ_t = ${f(capacity)} MPa`;
      }
      const pull = c.poleAxial_N !== 0 ? ` + ${f(Math.abs(c.poleAxial_N), 1)} × ${f(Math.abs(g.rise), 1)}` : '';
      return { memberCase: c, mode: 'bending at the root', demand: sm, capacity: Math.max(0, capacity), basis: kModBasis(fm.kMod, c.duration), sources: [fm.kModSource], line: `M = R_pole·L_f + |T|·dz = ${f(c.pole_N, 1)} × ${g.reach}${pull} = ${f(Mr / 1000, 1)} N·m; σ_m = M/W = ${f(sm)} MPa; ${fm.line}${interaction}` };
    });
    const intro = [
      `root to yoke: L_f = ${g.reach} mm horizontally, dz = ${f(g.rise, 1)} mm rise; ${S.label} (width × height), W = b·h²/6 = ${f(S.W, 0)} mm³, A = ${f(S.area, 0)} mm²`,
      ...bending.working,
      ...compression.working.filter((l) => !bending.working.includes(l)),
    ];
    const findings = [memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks, umax: ctx.limit('utilisation_max'), intro, sources: [...bending.sources, ...compression.sources], fix: 'Deepen the pole at the root (strength rises with the square of the height), shorten its reach, bring the yoke load down by moving the axle forward, or use selected straight-grained stock (set its grade).' })];

    const braking = cases.find((c) => c.id === 'braking');
    if (braking) {
      const K = ctx.limit('effective_length_factor');
      const strut = loadFactor(data, 'braking_strut_factor');
      const E = stiffness05(data, part, M);
      const Pcr = poleEulerLoad(g, E.fk, K.value);
      const demand = strut.value * braking.poleAxial_N;
      const shock = cases.find((c) => c.id === 'stopping-shock');
      const check: CaseCheck = {
        memberCase: braking,
        mode: 'buckling as a strut',
        demand,
        capacity: Pcr,
        basis: `Euler load with the 5th-percentile modulus, ${strut.value} × the braking force`,
        sources: [K.source, strut.source],
        line: `P_cr = π²·E_0.05·I_min/(K·L)² = π² × ${f(E.fk, 0)} × ${f(S.Imin, 0)} / (${K.value} × ${f(g.strutLength, 0)})² = ${f(Pcr, 0)} N; demand ${strut.value} × T = ${strut.value} × ${f(braking.poleAxial_N, 1)} = ${f(demand, 0)} N${shock ? `; the stopping shock ${f(shock.poleAxial_N, 0)} N is ${f(shock.poleAxial_N / Pcr, 3)} of P_cr` : ''}`,
      };
      const bIntro = [`strut length L = developed length from the root to the yoke = ${f(g.strutLength, 0)} mm; I_min = ${f(S.Imin, 0)} mm⁴ (${S.label})`, ...E.working];
      findings.push(memberFinding({ rule: this.id, part: part.label, unit: 'N', checks: [check], umax: ctx.limit('utilisation_max'), intro: bIntro, sources: E.sources, fix: 'Make the pole thicker in its thinner direction (the Euler load rises with the cube of it), shorten the free length, or add a stay that holds it at mid-length.' }));
    }
    return findings;
  },
};
