import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { ROAD_CASES, crewLeaves } from '../../ride/ride-verdict.ts';
import { rideSources, rideWorking } from './ride-working.ts';

export const crewAirborne: Rule = {
  id: 'ride.crew-airborne',
  title: 'Crew leaving the floor over the design bump',
  checks: 'Over a ridge across both tracks and a bump under one wheel at the design speed, how long each crew member is off the floor and how high they rise above it, against the limits.',
  kind: 'check',
  limits: ['max_airborne_ms', 'max_rise_mm'],
  run(ctx) {
    const time = ctx.limit('max_airborne_ms');
    const rise = ctx.limit('max_rise_mm');
    const limits = { maxAirborne_ms: time, maxRise_mm: rise };
    return ROAD_CASES.flatMap((which) => {
      const r = ctx.analysis.ride[which];
      return r.crew.map((c) => {
        const known = Number.isFinite(c.airborne_ms) && Number.isFinite(c.lift_mm);
        const leaves = !known || crewLeaves(c, limits);
        return makeFinding(this.id, {
          severity: leaves ? 'fail' : 'pass',
          subject: `${c.role}, ${r.title}`,
          value: c.airborne_ms,
          unit: 'ms',
          limit: time.value,
          message: !known ? 'rideNotComputed' : leaves ? 'rideCrewLeaves' : 'rideCrewStays',
          params: { role: c.role, case: r.title, value: c.airborne_ms.toFixed(1), limit: time.value, lift: c.lift_mm.toFixed(1), liftLimit: rise.value, dlf: c.floor_dlf.toFixed(2), why: 'the floor model did not settle (see floor.convergence)' },
          fix: leaves
            ? 'Damp the floor more (a tighter weave, a felt or hide underlay), drive slower over rough ground, or soften the wheels\' contact (a rawhide tyre); the floor-damping figure gives the damping that would keep the crew down.'
            : 'None needed.',
          source: `${time.source}; ${rise.source}; ${rideSources(r)}`,
          working: [...rideWorking(r), `${c.role}: off the floor ${c.airborne_ms.toFixed(1)} ms against ${time.value} ms; highest above the floor ${c.lift_mm.toFixed(1)} mm against ${rise.value} mm; rise above standing ${c.rise_mm.toFixed(1)} mm; peak floor force / weight = ${c.floor_dlf.toFixed(3)}`].join('\n'),
        });
      });
    });
  },
};
