import { formatQuantity } from '../../format/number-format.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { step } from '../../pipeline/step.ts';
import { ROAD_SHAPES, roadCase, type RideResult } from '../../ride/ride-types.ts';
import { withinLimit } from '../within-limit.ts';
import { NOT_RUN_FIX, notRunMessage, notRunReason, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

const yokeSteps = (r: RideResult) => [
  ...rideWorking(r),
  step('least yoke force', '', r.yokeForceMin_N, 'N'),
  step('greatest yoke force', '', r.yokeForceMax_N, 'N'),
  step("standing yoke force (the balance model's pole load)", '', r.yokeForceStatic_N, 'N'),
];

export const yokeUnloading = defineRule({
  id: 'ride.yoke-unloading',
  title: 'Yoke pulled up on the necks over rough ground and at the stone',
  checks: "Over the routine rough ground at the design speed, across both tracks and under one wheel, the least force between the pole and the yoke: below zero the pole pulls the yoke up on the horses' necks. The stone strike is reported apart where it pulls harder.",
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-ride', 'hunt-crossley-1975'],
  needs: ['ride'],
  limits: {
    yoke_force_N: { direction: 'min', unit: 'N', levels: { hard: 'warning' } },
    // The stone strike is accidental: a jerk the neck straps hold (design basis, section 8).
    stone_yoke_force_N: { direction: 'min', unit: 'N', levels: { hard: 'advice' } },
  },
  params: [],
  messages: {
    holds: { code: 2821, text: 'Over the {case} the yoke force stays between {value:N} and {max:N} (standing {static:N}): the pole never pulls the yoke up on the necks.' },
    lifts: { code: 2822, text: 'Over the {case} the yoke force falls to {value:N}, below {limit:N} (standing {static:N}, peak {max:N}): the pole pulls the yoke up on the necks.' },
    notComputed: { code: 2823, text: 'The yoke force over the {case} could not be found: {reason}.' },
    notRun: notRunMessage(2824, 'the yoke force over rough ground and at the stone'),
    stoneHolds: { code: 2825, text: 'At the {case} the yoke force falls to {value:N} (standing {static:N}, peak {max:N}), lower than over rough ground, but the pole still rests on the yoke.' },
    stoneJerks: { code: 2826, text: 'At the {case} the yoke force falls to {value:N}, below {limit:N} (standing {static:N}, peak {max:N}): the pole jerks the yoke up on the necks for a moment.' },
  },
  run(ctx) {
    const rides = ctx.models.ride;
    if (rides === null) return ctx.report(rideNotRun());
    const lim = ctx.limit('yoke_force_N');
    const stoneLim = ctx.limit('stone_yoke_force_N');
    for (const shape of ROAD_SHAPES) {
      const r = rides[roadCase('rough-ground', shape)];
      const s = rides[roadCase('stone', shape)];
      const common = { subject: `ride.${r.case}`, label: r.title, unit: 'N', sources: rideSourceIds(ctx.data, ctx.spec, r.case), load_case: 'rough-ground', combination: 'characteristic' as const };
      if (!Number.isFinite(r.yokeForceMin_N)) {
        ctx.report({ ...common, message: 'notComputed', params: { case: r.title, reason: notRunReason(r) }, severity: 'warning', fix: NOT_RUN_FIX, working: rideWorking(r) });
        continue;
      }
      const apart = Number.isFinite(s.yokeForceMin_N) && s.yokeForceMin_N < r.yokeForceMin_N;
      ctx.report({
        ...common,
        message: { pass: 'holds', warning: 'lifts' },
        params: { case: r.title, max: r.yokeForceMax_N, static: r.yokeForceStatic_N },
        value: r.yokeForceMin_N,
        against: { limit: 'yoke_force_N' },
        fix: withinLimit(r.yokeForceMin_N, lim)
          ? 'None needed.'
          : 'Put more of the load ahead of the axle (move the axle back or the crew forward) so the pole rests harder on the yoke, or drive slower over rough ground; make sure the yoke is strapped to the necks.',
        working: [...yokeSteps(r), `${s.title}: least yoke force ${formatQuantity(s.yokeForceMin_N, 'N')}${apart ? ': lower than over rough ground, reported apart (load case stone)' : ': no lower than over rough ground'}`],
      });
      if (!apart) continue;
      ctx.report({
        subject: `ride.${s.case}`,
        label: s.title,
        unit: 'N',
        sources: rideSourceIds(ctx.data, ctx.spec, s.case),
        load_case: 'stone',
        combination: 'accidental',
        message: { pass: 'stoneHolds', advice: 'stoneJerks' },
        params: { case: s.title, max: s.yokeForceMax_N, static: s.yokeForceStatic_N },
        value: s.yokeForceMin_N,
        against: { limit: 'stone_yoke_force_N' },
        fix: withinLimit(s.yokeForceMin_N, stoneLim) ? 'None needed.' : 'Strap the yoke to the necks so a strike cannot lift it off, and slow down for stones and rut edges.',
        working: yokeSteps(s),
      });
    }
  },
});
