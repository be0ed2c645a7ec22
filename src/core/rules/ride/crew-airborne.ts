import { severityRank } from '../../findings/severity.ts';
import { defineRule, type LimitSpec, type ResolvedLimit } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { step } from '../../pipeline/step.ts';
import { ROAD_CASES } from '../../ride/ride-verdict.ts';
import { withinLimit } from '../within-limit.ts';
import { notRunMessage, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

const LIMITS = {
  airborne_ms: { direction: 'max', unit: 'ms' },
  rise_mm: { direction: 'max', unit: 'mm' },
} as const satisfies Record<string, LimitSpec>;

type Name = keyof typeof LIMITS;

/** The limit that decides: the one the value is furthest beyond (by severity, then by utilisation). */
function governingLimit(values: Record<Name, number>, limits: Record<Name, ResolvedLimit>): Name {
  const g = (n: Name) => grade(values[n], limits[n], LIMITS[n]);
  const [a, b] = [g('airborne_ms'), g('rise_mm')];
  const rank = severityRank(b.severity) - severityRank(a.severity);
  return rank > 0 || (rank === 0 && (b.utilisation ?? 0) > (a.utilisation ?? 0)) ? 'rise_mm' : 'airborne_ms';
}

/** The level a message prints for a limit: the hard one where there is one. */
const shown = (l: ResolvedLimit) => (l.hard ?? l.advisory)!;

export const crewAirborne = defineRule({
  id: 'ride.crew-airborne',
  title: 'Crew leaving the floor over the design bump',
  checks: 'Over a ridge across both tracks and a bump under one wheel at the design speed, how long each crew member is off the floor and how high they rise above it, against the limits.',
  kind: 'check',
  method: ['design-basis-ride'],
  needs: ['ride'],
  limits: LIMITS,
  params: [],
  messages: {
    stays: { code: 2801, text: '{role} stays on the floor over the {case}: off it {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight.' },
    leaves: { code: 2802, text: '{role} leaves the floor over the {case}: off it {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight on landing.' },
    notComputed: { code: 2803, text: 'The ride model could not be run for the {case}: the floor model did not settle (see floor.convergence).' },
    notRun: notRunMessage(2804, 'whether the crew stay on the floor over the design bump'),
  },
  run(ctx) {
    const rides = ctx.models.ride;
    if (rides === null) return ctx.report(rideNotRun());
    const limits = { airborne_ms: ctx.limit('airborne_ms'), rise_mm: ctx.limit('rise_mm') };
    for (const which of ROAD_CASES) {
      const r = rides[which];
      const sources = rideSourceIds(ctx.data, ctx.spec, which);
      r.crew.forEach((c, i) => {
        // A crew member once in each road case: the case qualifies the subject.
        const where = { subject: `crew.${i}.${which}`, label: `${c.role}, ${r.title}`, load_case: which, sources };
        if (![c.airborne_ms, c.lift_mm, c.floor_dlf].every(Number.isFinite)) {
          ctx.report({
            ...where,
            message: 'notComputed',
            params: { case: r.title },
            severity: 'fail',
            fix: 'Fix what stops the floor model (see floor.convergence), then check again.',
            working: rideWorking(r),
          });
          return;
        }
        const values = { airborne_ms: c.airborne_ms, rise_mm: c.lift_mm };
        const name = governingLimit(values, limits);
        ctx.report({
          ...where,
          message: { pass: 'stays', warning: 'leaves', fail: 'leaves' },
          params: { role: c.role, case: r.title, airborne: c.airborne_ms, airborneLimit: shown(limits.airborne_ms), lift: c.lift_mm, liftLimit: shown(limits.rise_mm), dlf: c.floor_dlf },
          value: values[name],
          unit: LIMITS[name].unit,
          against: { limit: name },
          fix: withinLimit(c.airborne_ms, limits.airborne_ms) && withinLimit(c.lift_mm, limits.rise_mm)
            ? 'None needed.'
            : "Damp the floor more (a tighter weave, a felt or hide underlay), drive slower over rough ground, or soften the wheels' contact (a rawhide tyre); the floor-damping figure gives the damping that would keep the crew down.",
          working: [
            ...rideWorking(r),
            step(`${c.role}: time off the floor`, '', c.airborne_ms, 'ms'),
            step(`${c.role}: highest above the floor while off it`, '', c.lift_mm, 'mm'),
            step(`${c.role}: rise above standing`, '', c.rise_mm, 'mm'),
            step(`${c.role}: peak floor force / weight`, '', c.floor_dlf, '1'),
            `governing limit: ${name}`,
          ],
        });
      });
    }
  },
});
