import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { ROAD_CASES } from '../../ride/ride-verdict.ts';
import { rideSources, rideWorking } from './ride-working.ts';

export const yokeUnloading: Rule = {
  id: 'ride.yoke-unloading',
  title: 'Yoke pulled up on the necks over the design bump',
  checks: 'Over a ridge across both tracks and a bump under one wheel at the design speed, the least force between the pole and the yoke: below zero the pole pulls the yoke up on the horses\' necks.',
  kind: 'check',
  worst: 'warning',
  limits: ['lift_N'],
  run(ctx) {
    const lift = ctx.limit('lift_N');
    return ROAD_CASES.map((which) => {
      const r = ctx.analysis.ride[which];
      const lifts = !(r.yokeForceMin_N >= lift.value);
      return makeFinding(this.id, {
        severity: lifts ? 'warning' : 'pass',
        subject: r.title,
        value: r.yokeForceMin_N,
        unit: 'N',
        limit: lift.value,
        message: lifts ? 'rideYokeLifts' : 'rideYokeHolds',
        params: { case: r.title, value: r.yokeForceMin_N.toFixed(0), max: r.yokeForceMax_N.toFixed(0), static: r.yokeForceStatic_N.toFixed(0) },
        fix: lifts ? 'Put more of the load ahead of the axle (move the axle back or the crew forward) so the pole rests harder on the yoke, or drive slower over rough ground; make sure the yoke is strapped to the necks.' : 'None needed.',
        source: `${lift.source}; ${rideSources(r)}`,
        working: [...rideWorking(r), `yoke force: least ${r.yokeForceMin_N.toFixed(1)} N, greatest ${r.yokeForceMax_N.toFixed(1)} N, standing ${r.yokeForceStatic_N.toFixed(1)} N (the balance model's pole load); limit ${lift.value} N`].join('\n'),
      });
    });
  },
};
