import { eulerLoad } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { bucklingFactor } from '../../model/timber/buckling-factor.ts';
import { stiffness05, timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { memberReport, strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { BUCKLING_MESSAGES, STRESS_MESSAGES } from './member-messages.ts';
import { bucklingFactorSteps } from './buckling-steps.ts';

export const spokeMember = defineRule({
  id: 'member.spoke',
  title: 'Spoke crushing and buckling',
  checks: 'The spoke under the nave carries the whole wheel load in compression: crushing along the grain, and buckling over its free length between nave and felloe, in every load case.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'en-1995-1-1-6-3-2'],
  needs: ['mass', 'memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength (in buckling, of the buckling resistance)' } },
  params: ['effective_length_factor', 'straightness_factor', 'slenderness_threshold'],
  messages: { ...STRESS_MESSAGES, ...BUCKLING_MESSAGES },
  run(ctx) {
    const { spec, data } = ctx;
    const M = spec.moisture_content_pct;
    const part = timberPart(spec, 'spoke');
    const compression = timberStrength(data, part, 'compression', M);
    const E = stiffness05(data, part, M);
    const { width_mm: b, thickness_mm: t } = spec.wheels.spoke;
    const S = rectangle(b, t);
    const lay = ctx.models.mass.layout;
    const L = lay.spokeLength;
    const K = ctx.param('effective_length_factor');
    const beta = ctx.param('straightness_factor');
    const lim0 = ctx.param('slenderness_threshold');
    const Ncr = eulerLoad(E.fk, S.Imin, L, K.value);
    // The clear-wood f_k (not reduced for the grade) in the slenderness: the modulus is
    // clear-wood too, and the larger λ_rel is the safe side.
    const fck = compression.characteristic.fk;
    const lambdaRel = Math.sqrt((fck * S.area) / Ncr);
    const kc = bucklingFactor(lambdaRel, beta.value, lim0.value);
    const utilisation = ctx.limit('utilisation');
    const crush: CaseCheck[] = [];
    const buckle: CaseCheck[] = [];
    for (const c of ctx.models.memberCases) {
      const fc = compression.design(c.duration, c.gammaM);
      const sigma = c.wheel_N / S.area;
      crush.push(strengthCheck(c, 'crushing along the grain', sigma, compression, fc, [step('σ_c = N_w/A', `${num(c.wheel_N)} / ${num(S.area)}`, sigma, 'MPa')]));
      // The buckling resistance follows the same design strength: k_c·f_c,0,d·A against the wheel load.
      const Nb = kc * fc.value * S.area;
      const strength = strengthCheck(c, 'buckling', c.wheel_N, compression, fc, []);
      buckle.push({ ...strength, capacity: Nb, steps: [...strength.steps, step('N_b = k_c·f_c,0,d·A', `${num(kc)} × ${num(fc.value)} × ${num(S.area)}`, Nb, 'N'), step('N_w', '', c.wheel_N, 'N')] });
    }
    const section = [`${S.label} (width × thickness)`, step('A = b·t', `${num(b)} × ${num(t)}`, S.area, 'mm²')];
    ctx.report(
      stressReport({
        subject: 'wheel.spoke',
        label: 'spoke under the nave',
        part: part.label,
        checks: crush,
        limit: utilisation,
        intro: [...section, ...compression.working],
        sources: compression.sourceIds,
        fix: 'Use a larger spoke section, a stronger species, or selected straight-grained stock (set its grade).',
      }),
    );
    ctx.report(
      memberReport({
        subject: 'wheel.spoke.strut',
        label: 'spoke as a strut between nave and felloe',
        part: part.label,
        unit: 'N',
        checks: buckle,
        limit: utilisation,
        message: { pass: 'bucklingWithin', fail: 'bucklingOver' },
        intro: [
          step('L = felloe inner radius − nave radius', `${num(lay.felloeInner)} − ${num(spec.wheels.nave.diameter_mm)}/2`, L, 'mm'),
          ...section,
          step('I_min = max(b, t)·min(b, t)³/12', `${num(Math.max(b, t))} × ${num(Math.min(b, t))}³/12`, S.Imin, 'mm⁴'),
          ...compression.working,
          ...E.working,
          step('N_cr = π²·E_0.05·I_min/(K·L)²', `π² × ${num(E.fk)} × ${num(S.Imin)} / (${num(K.value)} × ${num(L)})²`, Ncr, 'N'),
          step('λ_rel = √(f_c,0,k·A / N_cr)', `√(${num(fck)} × ${num(S.area)} / ${num(Ncr)})`, lambdaRel, '1'),
          'the clear-wood f_c,0,k in λ_rel, not reduced for the grade: the larger λ_rel, the safe side',
          ...bucklingFactorSteps(lambdaRel, beta.value, lim0.value, kc),
        ],
        sources: [...compression.sourceIds, ...E.sourceIds, ...K.sources, ...beta.sources, ...lim0.sources],
        fix: 'Thicken the spoke in its thinner direction (buckling resistance rises with the cube of it), or shorten it with a larger nave or deeper felloe.',
      }),
    );
  },
});
