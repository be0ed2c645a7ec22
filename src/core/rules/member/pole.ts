import { bucklingFactor } from '../../model/timber/buckling-factor.ts';
import { poleCantilever, poleEulerLoad, rootMoment } from '../../model/members/pole-cantilever.ts';
import { stiffness05, timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { memberReport, strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { STRESS_MESSAGES } from './member-messages.ts';
import { strengthStep } from './strength-step.ts';
import { bucklingFactorSteps } from './buckling-steps.ts';

export const poleMember = defineRule({
  id: 'member.pole',
  title: 'Pole strength and buckling',
  checks: 'Bending of the pole where it leaves the box, as a cantilever carrying the yoke load and the pull or push along it, and the pole as a strut under the braking thrust and the stopping shock: the instability factor k_c of EN 1995-1-1 6.3.2 (its initial bow included) with the bending at the root (eq. 6.23).',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'en-1995-1-1-6-2-4', 'en-1995-1-1-6-3-2'],
  needs: ['mass', 'memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength (in buckling, of the buckling resistance)' } },
  params: ['effective_length_factor', 'straightness_factor', 'slenderness_threshold'],
  messages: {
    ...STRESS_MESSAGES,
    strutWithin: { code: 2306, text: '{part}, {mode}: the design thrust in "{case}" with what the bending at the root uses, {value:N}, is within its buckling resistance {limit:N} (k_c {kc:1} at a relative slenderness of {lrel:1}).' },
    strutOver: { code: 2307, text: '{part}, {mode}: the design thrust in "{case}" with what the bending at the root uses, {value:N}, exceeds its buckling resistance {limit:N} (k_c {kc:1} at a relative slenderness of {lrel:1}).' },
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
      // The push or pull along the pole is carried as the bending stress it uses up, so the
      // check stays demand against f_m,d (and finite where the axial force alone would break it).
      if (c.poleAxial_N > 0) {
        // EN 1995-1-1 eq. 6.19: (σ_c/f_c,0,d)² + σ_m/f_m,d ≤ 1.
        const fc = compression.design(c.duration, c.gammaM);
        const demand = sm + fm.value * (sa / fc.value) ** 2;
        return {
          ...plain,
          mode: 'bending at the root with the thrust',
          demand,
          steps: [
            ...plain.steps,
            step('σ_c = T/A', `${num(T)} / ${num(S.area)}`, sa, 'MPa'),
            strengthStep(compression, fc),
            step('σ_m + f_m,d·(σ_c/f_c,0,d)² (eq. 6.19)', `${num(sm)} + ${num(fm.value)} × (${num(sa)} / ${num(fc.value)})²`, demand, 'MPa'),
          ],
        };
      }
      if (c.poleAxial_N < 0) {
        // σ_t/f_t + σ_m/f_m ≤ 1 with f_t taken as f_m (clear wood is stronger in tension than in bending).
        const demand = sm + sa;
        return {
          ...plain,
          mode: 'bending at the root with the pull',
          demand,
          steps: [...plain.steps, step('σ_t = T/A', `${num(T)} / ${num(S.area)}`, sa, 'MPa'), step('σ_m + σ_t (f_t taken as f_m)', `${num(sm)} + ${num(sa)}`, demand, 'MPa')],
        };
      }
      return plain;
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

    // The pole as a strut in every case that pushes along it (braking, the stopping shock):
    // EN 1995-1-1 6.3.2, the thrust against k_c·f_c,0,d·A less what the bending at the root uses (eq. 6.23).
    const thrusts = cases.filter((c) => c.poleAxial_N > 0);
    if (thrusts.length === 0) return;
    const K = ctx.param('effective_length_factor');
    const beta = ctx.param('straightness_factor');
    const lim0 = ctx.param('slenderness_threshold');
    const E = stiffness05(data, part, M);
    const Pcr = poleEulerLoad(g, E.fk, K.value);
    // The clear-wood f_c,0,k (not reduced for the grade), as for the spokes: the larger λ_rel, the safe side.
    const fck = compression.characteristic.fk;
    const lambdaRel = Math.sqrt((fck * S.area) / Pcr);
    const kc = bucklingFactor(lambdaRel, beta.value, lim0.value);
    const strutChecks: CaseCheck[] = thrusts.map((c) => {
      const fc = compression.design(c.duration, c.gammaM);
      const fm = bending.design(c.duration, c.gammaM);
      const sm = rootMoment(g, c.pole_N, c.poleAxial_N) / S.W;
      // Eq. 6.23 as forces: N_d + k_c·f_c,0,d·A·σ_m,d/f_m,d ≤ k_c·f_c,0,d·A, the bending at the root
      // carried as the thrust it uses up (finite where the bending alone would break the pole).
      const capacity = kc * fc.value * S.area;
      const used = (capacity * sm) / fm.value;
      return {
        memberCase: c,
        mode: 'buckling as a strut',
        demand: c.poleAxial_N + used,
        capacity,
        basis: { kc, lrel: lambdaRel },
        sources: [...fc.kModSources],
        steps: [
          step('N_d, the design thrust along the pole', '', c.poleAxial_N, 'N'),
          strengthStep(compression, fc),
          step('σ_m,d at the root = M/W', `${num(rootMoment(g, c.pole_N, c.poleAxial_N))} / ${num(S.W)}`, sm, 'MPa'),
          strengthStep(bending, fm),
          step('N_b,Rd = k_c·f_c,0,d·A', `${num(kc)} × ${num(fc.value)} × ${num(S.area)}`, capacity, 'N'),
          step('N_m, the thrust the bending uses = N_b,Rd·σ_m,d/f_m,d', `${num(capacity)} × ${num(sm)} / ${num(fm.value)}`, used, 'N'),
          step('N_d + N_m (eq. 6.23 as forces)', `${num(c.poleAxial_N)} + ${num(used)}`, c.poleAxial_N + used, 'N'),
        ],
      };
    });
    ctx.report(
      memberReport({
        subject: 'pole.strut',
        label: 'pole as a strut',
        part: part.label,
        unit: 'N',
        checks: strutChecks,
        limit: utilisation,
        message: { pass: 'strutWithin', fail: 'strutOver' },
        intro: [
          step('L (developed length from the root to the yoke)', '', g.strutLength, 'mm'),
          step(`I_min (${S.label})`, '', S.Imin, 'mm⁴'),
          ...compression.working.filter((l) => !bending.working.includes(l)),
          ...E.working,
          step('P_cr = π²·E_0.05·I_min/(K·L)²', `π² × ${num(E.fk)} × ${num(S.Imin)} / (${num(K.value)} × ${num(g.strutLength)})²`, Pcr, 'N'),
          step('λ_rel = √(f_c,0,k·A / P_cr)', `√(${num(fck)} × ${num(S.area)} / ${num(Pcr)})`, lambdaRel, '1'),
          'the clear-wood f_c,0,k in λ_rel, not reduced for the grade: the larger λ_rel, the safe side',
          ...bucklingFactorSteps(lambdaRel, beta.value, lim0.value, kc),
        ],
        sources: [...E.sourceIds, ...K.sources, ...beta.sources, ...lim0.sources, 'en-1995-1-1-6-3-2'],
        fix: 'Make the pole thicker in its thinner direction (the Euler load rises with the cube of it), shorten the free length, or add a stay that holds it at mid-length.',
      }),
    );
  },
});
