import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { G } from '../../units/units.ts';

export const horseLoad = defineRule({
  id: 'balance.horse-load',
  title: 'Load on each horse',
  checks: "The yoke load each horse carries, standing with the crew as placed and in the worst load case, as a fraction of the lightest horse's body weight.",
  kind: 'check',
  method: ['design-basis-balance'],
  needs: ['loadCases', 'staticCase', 'horse'],
  limits: { load_fraction: { direction: 'max', unit: 'of body weight' } },
  params: [],
  // The levels are of different standing, and the messages say which is which:
  // the hard level is an analogy with ridden horses (no published limit for a
  // load through a yoke was found), the advisory level a judgement.
  messages: {
    within: { code: 2013, text: 'Each horse carries {value:N} on the yoke ({case}), {share:%} of its body weight ({mass:kg}, {basis}), within the advisory {advisory:N}, a judgement; the hard limit {hard:N} is an analogy with ridden horses.' },
    over: { code: 2014, text: 'Each horse carries {value:N} on the yoke in "{case}", {share:%} of its body weight ({mass:kg}, {basis}); the advisory limit {advisory:N} is a judgement, the hard limit {hard:N} an analogy with the load a ridden horse carries.' },
  },
  run(ctx) {
    const horse = ctx.models.horse;
    const mass = horse.mass_kg;
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
        params: { case: c.title, share: c.per_horse_N / weight, mass, basis: horse.basis_text },
        value: c.per_horse_N,
        unit: 'N',
        against: { limit: 'load_fraction', times: weight },
        load_case: c.id,
        // The limit is a share of the horse's weight under the loads as they are.
        combination: 'characteristic',
        sources: horse.sources,
        fix: 'Move the axle forward (towards the floor centre), move the crew or load back, or lighten the pole and yoke; confirm any limit with an equine professional.',
        working: [
          ...c.working.split('\n'),
          ...horse.working,
          step('m_horse·g', `${num(mass, 'kg')} × ${num(G)}`, weight, 'N'),
          ...(lim.advisory !== null ? [step('advisory limit = fraction × m_horse·g (a judgement)', `${num(lim.advisory)} × ${num(weight)}`, lim.advisory * weight, 'N')] : []),
          ...(lim.hard !== null ? [step('hard limit = fraction × m_horse·g (an analogy: the load a ridden horse carries)', `${num(lim.hard)} × ${num(weight)}`, lim.hard * weight, 'N')] : []),
        ],
      });
    }
  },
});
