import type { Combination } from '../../findings/finding.ts';
import { severityRank } from '../../findings/severity.ts';
import { formatQuantity } from '../../format/number-format.ts';
import { defineRule, type LimitSpec, type ResolvedLimit } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { step } from '../../pipeline/step.ts';
import { ROAD_SHAPES, roadCase, type CrewRide, type RideResult, type RoadGround } from '../../ride/ride-types.ts';
import { withinLimit } from '../within-limit.ts';
import { NOT_RUN_FIX, notRunMessage, notRunReason, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

const LIMITS = {
  airborne_ms: { direction: 'max', unit: 'ms' },
  rise_mm: { direction: 'max', unit: 'mm' },
  // The stone strike is accidental: beyond these the crew are thrown, a warning (design basis, section 8).
  stone_airborne_ms: { direction: 'max', unit: 'ms', levels: { hard: 'warning' } },
  stone_rise_mm: { direction: 'max', unit: 'mm', levels: { hard: 'warning' } },
} as const satisfies Record<string, LimitSpec>;

type Name = keyof typeof LIMITS;

type Message = 'stays' | 'leaves' | 'stoneHeld' | 'stoneThrown';

/** How each ground is judged: its two limits, its combination, its messages and its fix. */
const GROUNDS = {
  'rough-ground': {
    airborne: 'airborne_ms',
    rise: 'rise_mm',
    combination: 'characteristic',
    message: { pass: 'stays', warning: 'leaves', fail: 'leaves' },
    fix: "Damp the floor more (a tighter weave, a felt or hide underlay), drive slower over rough ground, or soften the wheels' contact (a rawhide tyre); the floor-damping figure gives the damping that would keep the crew down.",
  },
  stone: {
    airborne: 'stone_airborne_ms',
    rise: 'stone_rise_mm',
    combination: 'accidental',
    message: { pass: 'stoneHeld', warning: 'stoneThrown' },
    fix: 'Slow down for stones and rut edges, and hold on: no floor keeps a standing crew down on a hard strike at speed. A smaller design stone (operation.bump_height_mm) is a promise about the track, so make it one you can keep.',
  },
} as const satisfies Record<RoadGround, { airborne: Name; rise: Name; combination: Combination; message: Record<string, Message>; fix: string }>;

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
    notComputed: { code: 2803, text: 'The ride model could not be run for the {case}: {reason}.' },
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
    /** One crew member in one road case, judged as its ground is. */
    const judge = (over: RoadGround, r: RideResult, c: CrewRide, i: number, note: string[]) => {
      const g = GROUNDS[over];
      const name = governingLimit(c, g, limits);
      ctx.report({
        // A crew member once in each road case: the case qualifies the subject.
        subject: `crew.${i}.${r.case}`,
        label: `${c.role}, ${r.title}`,
        load_case: over,
        combination: g.combination,
        sources: rideSourceIds(ctx.data, ctx.spec, r.case),
        message: g.message,
        params: { role: c.role, case: r.title, airborne: c.airborne_ms, airborneLimit: shown(limits[g.airborne]), lift: c.lift_mm, liftLimit: shown(limits[g.rise]), dlf: c.floor_dlf },
        value: name === g.airborne ? c.airborne_ms : c.lift_mm,
        unit: LIMITS[name].unit,
        against: { limit: name },
        fix: withinLimit(c.airborne_ms, limits[g.airborne]) && withinLimit(c.lift_mm, limits[g.rise]) ? 'None needed.' : g.fix,
        working: [...rideWorking(r), ...measures(c), `governing limit: ${name}`, ...note],
      });
    };
    for (const shape of ROAD_SHAPES) {
      const rough = rides[roadCase('rough-ground', shape)];
      const stone = rides[roadCase('stone', shape)];
      rough.crew.forEach((c, i) => {
        if (!finite(c)) {
          ctx.report({ subject: `crew.${i}.${rough.case}`, label: `${c.role}, ${rough.title}`, load_case: 'rough-ground', combination: 'characteristic', message: 'notComputed', params: { case: rough.title, reason: notRunReason(rough) }, severity: 'fail', fix: NOT_RUN_FIX, working: rideWorking(rough) });
          return;
        }
        const s = stone.crew[i];
        const apart = finite(s) && worseAtStone(s, c);
        const seen = finite(s) ? `${formatQuantity(s.airborne_ms, 'ms')}, at most ${formatQuantity(s.lift_mm, 'mm')} above it` : 'not found';
        judge('rough-ground', rough, c, i, [`${stone.title}: off the floor ${seen}${apart ? ': further than over rough ground, reported apart (load case stone)' : ': no further than over rough ground'}`]);
        if (apart) judge('stone', stone, s, i, []);
      });
    }
  },
});
