import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { G } from '../../units/units.ts';

export const horseLoad = defineRule({
  id: 'balance.horse-load',
  title: 'Load on each horse',
  checks: "The yoke load each horse carries, standing with the crew as placed and in the worst load case, as a fraction of the lightest horse's body weight.",
  kind: 'check',
  method: ['design-basis-balance'],
  needs: ['loadCases', 'staticCase'],
  limits: { load_fraction: { direction: 'max', unit: 'of body weight' } },
  params: [],
  messages: {
    within: { code: 2012, text: 'Each horse carries {value:N} on the yoke ({case}), {share:%} of its body weight, within the advisory {advisory:N}.' },
    over: { code: 2011, text: 'Each horse carries {value:N} on the yoke in "{case}", {share:%} of its body weight; the advisory limit is {advisory:N} and the hard limit {hard:N}.' },
  },
  run(ctx) {
    const mass = ctx.spec.team.horse_mass_kg;
    const weight = mass * G;
    const lim = ctx.limit('load_fraction');
    const cases = ctx.models.loadCases;
    const stat = ctx.models.staticCase;
    const worst = cases.reduce((w, c) => (c.per_horse_N > w.per_horse_N ? c : w));
    for (const c of worst.id === stat.id ? [stat] : [stat, worst]) {
      ctx.report({
        subject: `case.${c.id}`,
        label: c.title,
        message: { pass: 'within', warning: 'over', fail: 'over' },
        params: { case: c.title, share: c.per_horse_N / weight },
        value: c.per_horse_N,
        unit: 'N',
        against: { limit: 'load_fraction', times: weight },
        load_case: c.id,
        // The limit is a share of the horse's weight under the loads as they are.
        combination: 'characteristic',
        fix: 'Move the axle forward (towards the floor centre), move the crew or load back, or lighten the pole and yoke; confirm any limit with an equine professional.',
        working: [
          ...c.working.split('\n'),
          step('m_horse·g', `${num(mass, 'kg')} × ${num(G)}`, weight, 'N'),
          ...(lim.advisory !== null ? [step('advisory limit = fraction × m_horse·g', `${num(lim.advisory)} × ${num(weight)}`, lim.advisory * weight, 'N')] : []),
          ...(lim.hard !== null ? [step('hard limit = fraction × m_horse·g', `${num(lim.hard)} × ${num(weight)}`, lim.hard * weight, 'N')] : []),
        ],
      });
    }
  },
});
