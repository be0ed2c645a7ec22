import { makeFinding } from '../../engine/make-finding.ts';
import { gradeFractions } from './fraction-grade.ts';
import type { Rule } from '../../engine/rule.ts';
import { G } from '../../units/units.ts';

const f3 = (v: number) => v.toFixed(3);

export const sliding: Rule = {
  id: 'turn.sliding',
  title: 'Sideways sliding in the planned turn',
  checks: "The lateral acceleration of the design turn against fractions of the ground's sliding threshold mu×g, and whether on this ground the chariot slides before it tips.",
  kind: 'check',
  limits: ['advisory_fraction', 'hard_fraction'],
  run(ctx) {
    const t = ctx.analysis.turn;
    if (!t.steady) return [];
    const ground = ctx.data.grounds[ctx.spec.operation.ground];
    const { adv, hard, advA, hardA, severity, lim } = gradeFractions(ctx, t.lateralAccel, t.slideAccel);
    const slidesFirst = t.lateralFriction < t.ssf;
    return [
      makeFinding(this.id, {
        severity,
        subject: `${ctx.spec.operation.speed_kmh} km/h on ${ground.name}`,
        value: t.lateralAccel,
        unit: 'm/s²',
        limit: lim.a,
        message: severity === 'pass' ? 'slideWithin' : 'slideOver',
        params: { value: t.lateralAccel.toFixed(2), ground: ground.name, mu: t.lateralFriction, level: lim.level, limit: lim.a.toFixed(2), order: slidesFirst ? 'it slides before it tips (mu < SSF)' : 'it tips before it slides (mu ≥ SSF)' },
        fix: severity === 'pass' ? 'None needed.' : 'Slow down or widen the turn; on loose or wet ground a sliding wheel can catch a rut and throw the chariot over.',
        source: `${lim.l.source}; lateral friction: ${ground.lateral_friction.source}`,
        working: [
          'a_slide = mu·g; the chariot slides before it tips where mu < SSF',
          `a_slide = ${t.lateralFriction} × ${G} = ${t.slideAccel.toFixed(2)} m/s²; SSF = ${f3(t.ssf)}: ${slidesFirst ? 'slides first' : 'tips first'}`,
          `a_lat = ${f3(t.lateralAccel)} m/s²; limits: advisory ${adv.value} × ${t.slideAccel.toFixed(2)} = ${advA.toFixed(2)}, hard ${hard.value} × ${t.slideAccel.toFixed(2)} = ${hardA.toFixed(2)} m/s²`,
          `utilisation = ${f3(t.lateralAccel)} / ${lim.a.toFixed(3)} = ${(t.lateralAccel / lim.a).toFixed(3)}`,
        ].join('\n'),
      }),
    ];
  },
};
