import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { tightestYokeRadius } from '../../model/turn.ts';
import { G, UNITS } from '../../units/units.ts';
import { lateralLimits } from '../../model/turn-limits.ts';

const kmh = (v: number) => v / UNITS.kmh.si;

export const rollover = defineRule({
  id: 'turn.rollover',
  title: 'Rollover in the planned turn',
  checks: 'The lateral acceleration of the design turn at the design speed, times the EQU factor on a variable action, against the quasi-static rollover threshold g×SSF times the EQU factor on a stabilising weight, with SSF = t/(2 h_g) for the rolling assembly with the crew as placed.',
  kind: 'check',
  method: ['design-basis-turning', 'nhtsa-ssf-2000', 'en-1990-a1-2a'],
  needs: ['turn'],
  limits: { lateral_fraction: { direction: 'max', unit: 'of the rollover threshold g·SSF × γ_G,stb' } },
  params: [],
  messages: {
    within: { code: 2624, text: 'The design turn needs {lateral:m/s²} of lateral acceleration ({share:%} of the rollover threshold); with the equilibrium factors, {value:m/s²} against {hard:m/s²}, within the advisory {advisory:m/s²}. The tightest turn at this speed is {tightest:m}; this turn stays within the advisory limit up to {speed:km/h}.' },
    over: { code: 2623, text: 'The design turn needs {lateral:m/s²} of lateral acceleration ({share:%} of the rollover threshold); with the equilibrium factors, {value:m/s²} against the advisory {advisory:m/s²} and the hard limit {hard:m/s²}. The tightest turn at this speed is {tightest:m}; this turn is within the advisory limit up to {speed:km/h}.' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    if (!t.steady || t.rolloverSpeed === null) return;
    const allowed = lateralLimits(ctx.data, t);
    const advA = (allowed.rollover.advisory ?? allowed.rollover.hard)!;
    const tightest = tightestYokeRadius(t.speed, advA, t.reach);
    const safeSpeed = t.yokeRadius * Math.sqrt(advA / t.axleRadius);
    const speed = ctx.spec.operation.speed_kmh;
    ctx.report({
      subject: 'turn.design',
      label: `${num(speed)} km/h on a ${num(t.yokeRadius)} m yoke path`,
      message: { pass: 'within', warning: 'over', fail: 'over' },
      params: { lateral: t.lateralAccel, share: t.lateralAccel / t.rolloverAccel, tightest, speed: kmh(safeSpeed) },
      value: allowed.gammaQ * t.lateralAccel,
      unit: 'm/s²',
      against: { limit: 'lateral_fraction', times: allowed.gammaStb * t.rolloverAccel },
      sources: allowed.sources,
      load_case: 'turn',
      combination: 'equilibrium',
      fix: `Slow to ${num(kmh(safeSpeed))} km/h for this turn, widen it to at least ${num(tightest)} m, widen the track, or lower the crew and load.`,
      working: [
        step('SSF = t / (2 h_g)', `${num(t.track)} / (2 × ${num(t.cgHeight)})`, t.ssf, '1'),
        step('a_roll = g·SSF', `${num(G)} × ${num(t.ssf)}`, t.rolloverAccel, 'm/s²'),
        step('v', `${num(speed)} km/h`, t.speed, 'm/s'),
        step('a_lat = v²·R_a / R_y²', `${num(t.speed)}² × ${num(t.axleRadius)} / ${num(t.yokeRadius)}²`, t.lateralAccel, 'm/s²'),
        step('EQU: γ_Q·a_lat against γ_G,stb·g·SSF', `${num(allowed.gammaQ)} × ${num(t.lateralAccel)} against ${num(allowed.gammaStb)} × ${num(t.rolloverAccel)}`, allowed.gammaQ * t.lateralAccel, 'm/s²'),
        step('v_roll = R_y·√(g·SSF / R_a)', `${num(t.yokeRadius)} × √(${num(t.rolloverAccel)} / ${num(t.axleRadius)})`, kmh(t.rolloverSpeed), 'km/h'),
        step(`tightest yoke path at ${num(speed)} km/h within the advisory limit`, '', tightest, 'm'),
        step('highest speed for this turn within the advisory limit', '', kmh(safeSpeed), 'km/h'),
      ],
    });
  },
});
