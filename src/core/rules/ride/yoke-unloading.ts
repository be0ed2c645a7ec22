import { defineRule } from '../../pipeline/define-rule.ts';
import { step } from '../../pipeline/step.ts';
import { ROAD_CASES } from '../../ride/ride-verdict.ts';
import { withinLimit } from '../within-limit.ts';
import { notRunMessage, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

export const yokeUnloading = defineRule({
  id: 'ride.yoke-unloading',
  title: 'Yoke pulled up on the necks over the design bump',
  checks: "Over a ridge across both tracks and a bump under one wheel at the design speed, the least force between the pole and the yoke: below zero the pole pulls the yoke up on the horses' necks.",
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-ride'],
  needs: ['ride'],
  limits: { yoke_force_N: { direction: 'min', unit: 'N', levels: { hard: 'warning' } } },
  params: [],
  messages: {
    holds: { code: 2821, text: 'Over the {case} the yoke force stays between {value:N} and {max:N} (standing {static:N}): the pole never pulls the yoke up on the necks.' },
    lifts: { code: 2822, text: 'Over the {case} the yoke force falls to {value:N}, below {limit:N} (standing {static:N}, peak {max:N}): the pole pulls the yoke up on the necks.' },
    notComputed: { code: 2823, text: 'The yoke force over the {case} could not be found: the ride model gave no finite force.' },
    notRun: notRunMessage(2824, 'the yoke force over the design bump'),
  },
  run(ctx) {
    const rides = ctx.models.ride;
    if (rides === null) return ctx.report(rideNotRun());
    const lim = ctx.limit('yoke_force_N');
    for (const which of ROAD_CASES) {
      const r = rides[which];
      const common = {
        subject: `ride.${which}`,
        label: r.title,
        unit: 'N',
        sources: rideSourceIds(ctx.data, ctx.spec, which),
        load_case: which,
      };
      const working = [
        ...rideWorking(r),
        step('least yoke force', '', r.yokeForceMin_N, 'N'),
        step('greatest yoke force', '', r.yokeForceMax_N, 'N'),
        step("standing yoke force (the balance model's pole load)", '', r.yokeForceStatic_N, 'N'),
      ];
      if (!Number.isFinite(r.yokeForceMin_N)) {
        ctx.report({ ...common, message: 'notComputed', params: { case: r.title }, severity: 'warning', fix: 'Fix what stops the ride model (see floor.convergence), then check again.', working });
        continue;
      }
      ctx.report({
        ...common,
        message: { pass: 'holds', warning: 'lifts' },
        params: { case: r.title, max: r.yokeForceMax_N, static: r.yokeForceStatic_N },
        value: r.yokeForceMin_N,
        against: { limit: 'yoke_force_N' },
        fix: withinLimit(r.yokeForceMin_N, lim)
          ? 'None needed.'
          : 'Put more of the load ahead of the axle (move the axle back or the crew forward) so the pole rests harder on the yoke, or drive slower over rough ground; make sure the yoke is strapped to the necks.',
        working,
      });
    }
  },
});
