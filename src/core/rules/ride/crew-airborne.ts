import { severityRank } from '../../findings/severity.ts';
import { formatQuantity } from '../../format/number-format.ts';
import { defineRule, type LimitSpec, type ResolvedLimit } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { step } from '../../pipeline/step.ts';
import { ROAD_SHAPES, roadCase, type CrewRide } from '../../ride/ride-types.ts';
import { withinLimit } from '../within-limit.ts';
import { notRunMessage, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

const LIMITS = {
  airborne_ms: { direction: 'max', unit: 'ms' },
  rise_mm: { direction: 'max', unit: 'mm' },
  // The stone strike is accidental: beyond these the crew are thrown, a warning (design basis, section 8).
  stone_airborne_ms: { direction: 'max', unit: 'ms', levels: { hard: 'warning' } },
  stone_rise_mm: { direction: 'max', unit: 'mm', levels: { hard: 'warning' } },
} as const satisfies Record<string, LimitSpec>;

type Name = keyof typeof LIMITS;

/** The two limits a ground is judged against: time off the floor, height above it. */
const PAIRS = {
  'rough-ground': { airborne: 'airborne_ms', rise: 'rise_mm' },
  stone: { airborne: 'stone_airborne_ms', rise: 'stone_rise_mm' },
} as const satisfies Record<string, { airborne: Name; rise: Name }>;

/** The limit that decides: the one the value is furthest beyond (by severity, then by utilisation). */
function governingLimit(c: CrewRide, pair: { airborne: Name; rise: Name }, limits: Record<Name, ResolvedLimit>): Name {
  const g = (n: Name, v: number) => grade(v, limits[n], LIMITS[n]);
  const [a, b] = [g(pair.airborne, c.airborne_ms), g(pair.rise, c.lift_mm)];
  const rank = severityRank(b.severity) - severityRank(a.severity);
  return rank > 0 || (rank === 0 && (b.utilisation ?? 0) > (a.utilisation ?? 0)) ? pair.rise : pair.airborne;
}

/** The level a message prints for a limit: the hard one where there is one. */
const shown = (l: ResolvedLimit) => (l.hard ?? l.advisory)!;

/** The stone throws this crew member further than the rough ground does: it is reported apart. */
const worseAtStone = (stone: CrewRide, rough: CrewRide) => stone.airborne_ms > rough.airborne_ms || stone.lift_mm > rough.lift_mm;

const finite = (c: CrewRide) => [c.airborne_ms, c.lift_mm, c.floor_dlf].every(Number.isFinite);

export const crewAirborne = defineRule({
  id: 'ride.crew-airborne',
  title: 'Crew leaving the floor over rough ground and at the stone',
  checks: 'Over the routine rough ground at the design speed, across both tracks and under one wheel, how long each crew member is off the floor and how high they rise above it, against the limits; the stone strike is reported apart where it throws them further.',
  kind: 'check',
  method: ['design-basis-ride', 'hunt-crossley-1975'],
  needs: ['ride'],
  limits: LIMITS,
  params: [],
  messages: {
    stays: { code: 2801, text: '{role} stays on the floor over the {case}: off it {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight.' },
    leaves: { code: 2802, text: '{role} leaves the floor over the {case}: off it {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight on landing.' },
    notComputed: { code: 2803, text: 'The ride model could not be run for the {case}: the floor model did not settle (see floor.convergence).' },
    notRun: notRunMessage(2804, 'whether the crew stay on the floor over rough ground and at the stone'),
    stoneHeld: { code: 2805, text: '{role} keeps their footing at the {case}: off the floor {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight.' },
    stoneThrown: { code: 2806, text: '{role} is thrown off the floor at the {case}: off it {airborne:ms} in all (limit {airborneLimit:ms}), at most {lift:mm} above it (limit {liftLimit:mm}); peak floor force {dlf:1} × their weight on landing.' },
  },
  run(ctx) {
    const rides = ctx.models.ride;
    if (rides === null) return ctx.report(rideNotRun());
    const limits = Object.fromEntries((Object.keys(LIMITS) as Name[]).map((n) => [n, ctx.limit(n)])) as Record<Name, ResolvedLimit>;
    const measures = (c: CrewRide) => [
      step(`${c.role}: time off the floor (gap open)`, '', c.airborne_ms, 'ms'),
      step(`${c.role}: highest above the floor while off it`, '', c.lift_mm, 'mm'),
      step(`${c.role}: rise above standing`, '', c.rise_mm, 'mm'),
      step(`${c.role}: peak floor force / weight`, '', c.floor_dlf, '1'),
    ];
    for (const shape of ROAD_SHAPES) {
      const rough = rides[roadCase('rough-ground', shape)];
      const stone = rides[roadCase('stone', shape)];
      rough.crew.forEach((c, i) => {
        // A crew member once in each road case: the case qualifies the subject.
        const where = { subject: `crew.${i}.${rough.case}`, label: `${c.role}, ${rough.title}`, load_case: 'rough-ground', combination: 'characteristic' as const, sources: rideSourceIds(ctx.data, ctx.spec, rough.case) };
        if (!finite(c)) {
          ctx.report({ ...where, message: 'notComputed', params: { case: rough.title }, severity: 'fail', fix: 'Fix what stops the floor model (see floor.convergence), then check again.', working: rideWorking(rough) });
          return;
        }
        const s = stone.crew[i];
        const apart = finite(s) && worseAtStone(s, c);
        const name = governingLimit(c, PAIRS['rough-ground'], limits);
        ctx.report({
          ...where,
          message: { pass: 'stays', warning: 'leaves', fail: 'leaves' },
          params: { role: c.role, case: rough.title, airborne: c.airborne_ms, airborneLimit: shown(limits.airborne_ms), lift: c.lift_mm, liftLimit: shown(limits.rise_mm), dlf: c.floor_dlf },
          value: name === 'airborne_ms' ? c.airborne_ms : c.lift_mm,
          unit: LIMITS[name].unit,
          against: { limit: name },
          fix: withinLimit(c.airborne_ms, limits.airborne_ms) && withinLimit(c.lift_mm, limits.rise_mm)
            ? 'None needed.'
            : "Damp the floor more (a tighter weave, a felt or hide underlay), drive slower over rough ground, or soften the wheels' contact (a rawhide tyre); the floor-damping figure gives the damping that would keep the crew down.",
          working: [
            ...rideWorking(rough),
            ...measures(c),
            `governing limit: ${name}`,
            `${stone.title}: off the floor ${finite(s) ? `${formatQuantity(s.airborne_ms, 'ms')}, at most ${formatQuantity(s.lift_mm, 'mm')} above it` : 'not found'}${apart ? ': further than over rough ground, reported apart (load case stone)' : ': no further than over rough ground'}`,
          ],
        });
        if (!apart) return;
        const stoneName = governingLimit(s, PAIRS.stone, limits);
        ctx.report({
          subject: `crew.${i}.${stone.case}`,
          label: `${s.role}, ${stone.title}`,
          load_case: 'stone',
          combination: 'accidental',
          sources: rideSourceIds(ctx.data, ctx.spec, stone.case),
          message: { pass: 'stoneHeld', warning: 'stoneThrown' },
          params: { role: s.role, case: stone.title, airborne: s.airborne_ms, airborneLimit: shown(limits.stone_airborne_ms), lift: s.lift_mm, liftLimit: shown(limits.stone_rise_mm), dlf: s.floor_dlf },
          value: stoneName === 'stone_airborne_ms' ? s.airborne_ms : s.lift_mm,
          unit: LIMITS[stoneName].unit,
          against: { limit: stoneName },
          fix: withinLimit(s.airborne_ms, limits.stone_airborne_ms) && withinLimit(s.lift_mm, limits.stone_rise_mm)
            ? 'None needed.'
            : 'Slow down for stones and rut edges, and hold on: no floor keeps a standing crew down on a hard strike at speed. A smaller design stone (operation.bump_height_mm) is a promise about the track, so make it one you can keep.',
          working: [...rideWorking(stone), ...measures(s), `governing limit: ${stoneName}`],
        });
      });
    }
  },
});
