import { loadFactor } from '../../model/load-factors.ts';
import { poleCantilever, poleEulerLoad, rootMoment } from '../../model/members/pole-cantilever.ts';
import { stiffness05, timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { memberReport, strengthCheck, stressReport, type CaseCheck, type Working } from './member-finding.ts';
import { STRESS_MESSAGES } from './member-messages.ts';
import { strengthStep } from './strength-step.ts';

export const poleMember = defineRule({
  id: 'member.pole',
  title: 'Pole strength and buckling',
  checks: 'Bending of the pole where it leaves the box, as a cantilever carrying the yoke load and the pull or push along it, and Euler buckling of the pole as a strut under the braking force with a margin.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'en-1995-1-1-6-2-4'],
  needs: ['mass', 'memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength (in buckling, of the Euler load)' } },
  params: ['effective_length_factor'],
  messages: {
    ...STRESS_MESSAGES,
    strutWithin: { code: 2306, text: '{part}, {mode}: {value:N} ({factor:1} × the braking force), within the Euler load {limit:N} (modulus at its fifth percentile); case "{case}".' },
    strutOver: { code: 2307, text: '{part}, {mode}: {value:N} ({factor:1} × the braking force) exceeds the Euler load {limit:N} (modulus at its fifth percentile) in "{case}".' },
  },
  run(ctx) {
    const { spec, data } = ctx;
    const M = spec.moisture_content_pct;
    const part = timberPart(spec, 'pole');
    const bending = timberStrength(data, part, 'bending', M);
    const compression = timberStrength(data, part, 'compression', M);
    const g = poleCantilever(spec, ctx.models.mass.layout);
    const S = g.section;
    const cases = ctx.models.memberCases.filter((c) => c.id !== 'turn');
    const checks: CaseCheck[] = cases.map((c) => {
      const fm = bending.design(c.duration, c.gammaM);
      const Mr = rootMoment(g, c.pole_N, c.poleAxial_N);
      const sm = Mr / S.W;
      const sa = Math.abs(c.poleAxial_N) / S.area;
      const T = Math.abs(c.poleAxial_N);
      const plain = strengthCheck(c, 'bending at the root', sm, bending, fm, [
        T > 0
          ? step('M = R_pole·L_f + |T|·dz', `${num(c.pole_N)} × ${num(g.reach)} + ${num(T)} × ${num(Math.abs(g.rise))}`, Mr, 'N·mm')
          : step('M = R_pole·L_f', `${num(c.pole_N)} × ${num(g.reach)}`, Mr, 'N·mm'),
        step('σ_m = M/W', `${num(Mr)} / ${num(S.W)}`, sm, 'MPa'),
      ]);
      const steps: Working[] = [...plain.steps];
      let capacity = fm.value;
      if (c.poleAxial_N > 0) {
        // EN 1995-1-1 eq. 6.19: (σ_c/f_c)² + σ_m/f_m ≤ 1, as the bending strength left.
        const fc = compression.design(c.duration, c.gammaM);
        capacity = fm.value * (1 - (sa / fc.value) ** 2);
        steps.push(
          step('σ_c = T/A', `${num(T)} / ${num(S.area)}`, sa, 'MPa'),
          strengthStep(compression, fc),
          step('bending strength left = f_m,d·(1 − (σ_c/f_c,0,d)²)', `${num(fm.value)} × (1 − (${num(sa)} / ${num(fc.value)})²)`, capacity, 'MPa'),
        );
      } else if (c.poleAxial_N < 0) {
        // σ_t/f_t + σ_m/f_m ≤ 1 with f_t taken as f_m (clear wood is stronger in tension than in bending).
        capacity = fm.value - sa;
        steps.push(step('σ_t = T/A', `${num(T)} / ${num(S.area)}`, sa, 'MPa'), step('bending strength left = f_m,d − σ_t', `${num(fm.value)} − ${num(sa)}`, capacity, 'MPa'));
      }
      return { ...plain, capacity: Math.max(0, capacity), steps };
    });
    const utilisation = ctx.limit('utilisation');
    ctx.report(
      stressReport({
        subject: 'pole.root',
        label: 'pole at the root',
        part: part.label,
        checks,
        limit: utilisation,
        intro: [
          step('L_f (root to yoke, horizontally)', '', g.reach, 'mm'),
          step('dz (rise from the root to the yoke)', '', g.rise, 'mm'),
          `${S.label} (width × height)`,
          step('W = b·h²/6', `${num(spec.pole.width_mm)} × ${num(spec.pole.height_mm)}²/6`, S.W, 'mm³'),
          step('A = b·h', `${num(spec.pole.width_mm)} × ${num(spec.pole.height_mm)}`, S.area, 'mm²'),
          ...bending.working,
          ...compression.working.filter((l) => !bending.working.includes(l)),
        ],
        sources: [...bending.sourceIds, ...compression.sourceIds],
        fix: 'Deepen the pole at the root (strength rises with the square of the height), shorten its reach, bring the yoke load down by moving the axle forward, or use selected straight-grained stock (set its grade).',
      }),
    );

    const braking = cases.find((c) => c.id === 'braking');
    if (!braking) return;
    const K = ctx.param('effective_length_factor');
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
      basis: { factor: strut.value },
      sources: [...K.sources, ...strut.sources],
      steps: [
        step('P_cr = π²·E_0.05·I_min/(K·L)²', `π² × ${num(E.fk)} × ${num(S.Imin)} / (${num(K.value)} × ${num(g.strutLength)})²`, Pcr, 'N'),
        step('demand = braking_strut_factor × T', `${num(strut.value)} × ${num(braking.poleAxial_N)}`, demand, 'N'),
        ...(shock ? [step("the stopping shock's share of P_cr = T_shock / P_cr", `${num(shock.poleAxial_N)} / ${num(Pcr)}`, shock.poleAxial_N / Pcr, '1')] : []),
      ],
    };
    ctx.report(
      memberReport({
        subject: 'pole.strut',
        label: 'pole as a strut',
        part: part.label,
        unit: 'N',
        checks: [check],
        limit: utilisation,
        message: { pass: 'strutWithin', fail: 'strutOver' },
        intro: [
          step('L (developed length from the root to the yoke)', '', g.strutLength, 'mm'),
          step(`I_min (${S.label})`, '', S.Imin, 'mm⁴'),
          ...E.working,
        ],
        sources: E.sourceIds,
        fix: 'Make the pole thicker in its thinner direction (the Euler load rises with the cube of it), shorten the free length, or add a stay that holds it at mid-length.',
      }),
    );
  },
});
