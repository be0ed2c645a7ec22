import { makeFinding } from '../../engine/make-finding.ts';
import { gradeFractions } from './fraction-grade.ts';
import type { Rule } from '../../engine/rule.ts';
import { tightestYokeRadius } from '../../model/turn.ts';
import { G, UNITS } from '../../units/units.ts';

const f3 = (v: number) => v.toFixed(3);
const kmh = (v: number) => v / UNITS.kmh.si;

export const rollover: Rule = {
  id: 'turn.rollover',
  title: 'Rollover in the planned turn',
  checks: 'The lateral acceleration of the design turn at the design speed against fractions of the quasi-static rollover threshold g×SSF, with SSF = t/(2 h_g) for the rolling assembly with the crew as placed.',
  kind: 'check',
  limits: ['advisory_fraction', 'hard_fraction'],
  run(ctx) {
    const t = ctx.analysis.turn;
    if (!t.steady) return [];
    const { adv, hard, advA, hardA, severity, lim } = gradeFractions(ctx, t.lateralAccel, t.rolloverAccel);
    const tightest = tightestYokeRadius(t.speed, advA, t.reach);
    const safeSpeed = t.yokeRadius * Math.sqrt(advA / t.axleRadius);
    return [
      makeFinding(this.id, {
        severity,
        subject: `${ctx.spec.operation.speed_kmh} km/h on a ${t.yokeRadius} m yoke path`,
        value: t.lateralAccel,
        unit: 'm/s²',
        limit: lim.a,
        message: severity === 'pass' ? 'rolloverWithin' : 'rolloverOver',
        params: { value: t.lateralAccel.toFixed(2), pct: ((100 * t.lateralAccel) / t.rolloverAccel).toFixed(0), level: lim.level, limitPct: (100 * lim.l.value).toFixed(0), tightest: tightest.toFixed(1), speed: kmh(safeSpeed).toFixed(1) },
        fix: severity === 'pass'
          ? 'None needed.'
          : `Slow to ${kmh(safeSpeed).toFixed(1)} km/h for this turn, widen it to at least ${tightest.toFixed(1)} m, widen the track, or lower the crew and load.`,
        source: lim.l.source,
        working: [
          'SSF = t / (2 h_g); a_roll = g·SSF; a_lat = v²·R_a / R_y²',
          `SSF = ${f3(t.track)} / (2 × ${f3(t.cgHeight)}) = ${f3(t.ssf)}; a_roll = ${G} × ${f3(t.ssf)} = ${t.rolloverAccel.toFixed(2)} m/s²`,
          `v = ${ctx.spec.operation.speed_kmh} km/h = ${f3(t.speed)} m/s; a_lat = ${f3(t.speed)}² × ${f3(t.axleRadius)} / ${t.yokeRadius}² = ${f3(t.lateralAccel)} m/s²`,
          `limits: advisory ${adv.value} × ${t.rolloverAccel.toFixed(2)} = ${advA.toFixed(2)} m/s²; hard ${hard.value} × ${t.rolloverAccel.toFixed(2)} = ${hardA.toFixed(2)} m/s²`,
          `utilisation = ${f3(t.lateralAccel)} / ${lim.a.toFixed(3)} = ${(t.lateralAccel / lim.a).toFixed(3)}`,
          `rollover speed for this turn v_roll = R_y·√(g·SSF / R_a) = ${t.yokeRadius} × √(${t.rolloverAccel.toFixed(2)} / ${f3(t.axleRadius)}) = ${f3(t.rolloverSpeed)} m/s = ${kmh(t.rolloverSpeed).toFixed(1)} km/h`,
          `tightest yoke path at ${ctx.spec.operation.speed_kmh} km/h within the advisory limit: ${tightest.toFixed(2)} m; highest speed for this turn within it: ${kmh(safeSpeed).toFixed(1)} km/h`,
        ].join('\n'),
      }),
    ];
  },
};
