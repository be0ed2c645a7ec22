import { combinationFactors } from '../../model/combination-factors.ts';
import { timberStrength, type TimberStrength } from '../../model/timber/design-strength.ts';
import { navePart, timberPart } from '../../model/timber/timber-part.ts';
import { naveBearing, naveGeometry, type NaveGeometry } from '../../model/wheel/nave-bearing.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { stressReport, type CaseCheck, type Working } from '../member/member-finding.ts';
import { STRESS_MESSAGES } from '../member/member-messages.ts';
import { strengthStep } from '../member/strength-step.ts';
import { naveLoads, type NaveLoad, type WheelSide } from './nave-loads.ts';

/** A bearing pressure against k_c,90 times the design strength across the grain of the case. */
function acrossCheck(load: NaveLoad, mode: string, p: number, s: TimberStrength, kc90: number, steps: readonly Working[]): CaseCheck {
  const d = s.design(load.info.duration, load.info.gammaM);
  const capacity = kc90 * d.value;
  return {
    memberCase: load.info,
    mode,
    demand: p,
    capacity,
    basis: { kMod: d.kMod },
    sources: d.kModSources,
    steps: [...steps, strengthStep(s, d, 'f_c,90'), step('k_c,90·f_c,90,d', `${num(kc90)} × ${num(d.value)}`, capacity, 'MPa')],
  };
}

/** The more loaded bearing zone in one case, worked once, and its pressure against the arm and against the bore. */
function caseChecks(g: NaveGeometry, load: NaveLoad, arm: TimberStrength, bore: TimberStrength, kc90: number): CaseCheck[] {
  const b = naveBearing(g, load.N, load.F);
  const pressure = step('p = R/(d·l_zone)', `${num(b.more)} / (${num(g.bore)} × ${num(g.zone)})`, b.pressure, 'MPa');
  const statics: Working[] = [
    step('N_w', '', load.N, 'N'),
    load.side,
    step('M = F·r + N_w·e', `${num(load.F)} × ${num(g.wheelRadius)} + ${num(load.N)} × ${num(g.offset)}`, b.moment, 'N·mm'),
    step('R = N_w/2 + M/L_b (the more loaded zone)', `${num(load.N)}/2 + ${num(b.moment)}/${num(g.span)}`, b.more, 'N'),
    step(`R_other = N_w/2 − M/L_b${b.less < 0 ? ' (below zero: that zone bears on the far side of the arm)' : ''}`, `${num(load.N)}/2 − ${num(b.moment)}/${num(g.span)}`, b.less, 'N'),
    pressure,
  ];
  return [
    acrossCheck(load, 'bearing on the axle arm, across its grain', b.pressure, arm, kc90, statics),
    acrossCheck(load, 'bearing in the nave bore, across its grain', b.pressure, bore, kc90, [pressure]),
  ];
}

const WHEELS: Record<WheelSide, { label: string; part: string; side: string }> = {
  outer: {
    label: 'nave of the outer wheel in the design turn',
    part: "outer wheel's nave",
    side: "in the turn the ground pushes the outer wheel's rim inward: the nave's inner end bears hardest",
  },
  inner: {
    label: 'nave of the inner wheel in the design turn',
    part: "inner wheel's nave",
    side: "in the turn the ground pushes the inner wheel's rim toward the turn's centre, outward: the nave's outer end bears hardest",
  },
};

export const nave = defineRule({
  id: 'wheel.nave',
  title: 'Nave bearing on the axle arm under side load',
  checks:
    "Each wheel's nave as a short beam on two bearings at the ends of its bore: the side force at the rim (the ground's lateral force in the design turn, on the outer and on the inner wheel; on the stone, the peak wheel force times the ground's lateral friction) times the wheel radius, with the wheel load, gives the bearing reactions; their pressure on the axle arm and in the nave bore against each timber's design strength across the grain.",
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'design-basis-turning', 'en-1995-1-1-6-1-5'],
  needs: ['memberCases', 'turn'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: ['bearing_zone_fraction', 'k_c90'],
  messages: STRESS_MESSAGES,
  run(ctx) {
    const { spec, data } = ctx;
    const M = spec.moisture_content_pct;
    const zone = ctx.param('bearing_zone_fraction');
    const kc90 = ctx.param('k_c90');
    const g = naveGeometry(spec, zone.value);
    const axle = timberPart(spec, 'axle');
    const arm = timberStrength(data, axle, 'compression', M, 90);
    const bore = timberStrength(data, navePart(spec), 'compression', M, 90);
    const turn = ctx.models.turn;
    const ground = data.grounds[spec.operation.ground];
    const input = { spec, cases: ctx.models.memberCases, turn, gammaQ: combinationFactors(data).gammaQ, mu: turn.lateralFriction };
    const intro: Working[] = [
      'the nave on the axle arm as a short beam on two bearings: the bore bears over a zone at each end, the middle of the bore clear; each zone takes a share of the wheel load and the couple of the side force',
      step('l_zone = bearing_zone_fraction·L', `${num(zone.value)} × ${num(g.length)}`, g.zone, 'mm'),
      step('L_b = L − l_zone (between the zones\' centres)', `${num(g.length)} − ${num(g.zone)}`, g.span, 'mm'),
      step('d (the bore, the arm\'s diameter in the nave)', '', g.bore, 'mm'),
      step('r (wheel radius: the side force acts at the rim, this far below the axle)', '', g.wheelRadius, 'mm'),
      step('e (offset of the wheel\'s plane from the nave\'s mid-length)', '', g.offset, 'mm'),
      "e = 0: the specification gives no dish or offset, and the wheel is taken central on its nave, as member.axle takes it",
      `the stone: struck square it pushes up and back, not sideways; struck at an angle the tyre takes a side force, at most the ground's lateral friction times the wheel force before it slips (${ground.name}: μ_lat = ${num(turn.lateralFriction)}); that bound is assumed at the peak force`,
      'the mean pressure over the zone\'s projected area (bore × zone length) presses across the grain of the arm and of the nave; no spread along the grain beyond the zone is credited',
      step('k_c,90 (EN 1995-1-1 section 6.1.5)', '', kc90.value, '1'),
      'on the axle arm:',
      ...arm.working,
      'in the nave bore:',
      ...bore.working,
    ];
    const sources = [...new Set([...arm.sourceIds, ...bore.sourceIds, ...zone.sources, ...kc90.sources, ...ground.lateral_friction.sources])];
    for (const which of ['outer', 'inner'] as const) {
      const w = WHEELS[which];
      const checks = naveLoads(which, input).flatMap((l) => caseChecks(g, l, arm, bore, kc90.value));
      ctx.report(
        stressReport({
          subject: `wheel.${which}.nave`,
          label: w.label,
          part: w.part,
          checks,
          limit: ctx.limit('utilisation'),
          intro: [...intro, w.side],
          sources,
          fix: 'Lengthen the nave (the bearing reactions fall as the distance between its bearings grows, and each zone grows with it), bore it larger for a thicker arm, use a harder species for the nave or the axle, or take the turn slower or wider.',
        }),
      );
    }
  },
});
