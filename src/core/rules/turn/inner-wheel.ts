import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

const f3 = (v: number) => v.toFixed(3);

export const innerWheel: Rule = {
  id: 'turn.inner-wheel',
  title: 'The inner wheel rolls forward in the planned turn',
  checks: "The inner wheel's path radius in the tightest planned turn is not below zero; below it the inner wheel runs backwards and scrubs, twisting the axle arm and the nave.",
  kind: 'check',
  worst: 'warning',
  limits: ['least_inner_radius_m'],
  run(ctx) {
    const t = ctx.analysis.turn;
    if (!t.steady) return [];
    const lim = ctx.limit('least_inner_radius_m');
    const ok = t.innerRadius >= lim.value;
    return [
      makeFinding(this.id, {
        severity: ok ? 'pass' : 'warning',
        subject: `turn on a ${t.yokeRadius} m yoke path`,
        value: t.innerRadius,
        unit: 'm',
        limit: lim.value,
        message: ok ? 'innerWheelForward' : 'innerWheelBackward',
        params: { inner: f3(t.innerRadius), outer: f3(t.outerRadius), ratio: t.wheelSpeedRatio.toFixed(3) },
        fix: ok ? 'None needed.' : 'Plan a wider turn; a turn this tight can only be made at a walk, with the inner wheel dragged round.',
        source: lim.source,
        working: [
          'R_inner = R_a − t/2, R_outer = R_a + t/2, wheel speed ratio = R_inner / R_outer',
          `R_inner = ${f3(t.axleRadius)} − ${f3(t.track)}/2 = ${f3(t.innerRadius)} m; R_outer = ${f3(t.axleRadius)} + ${f3(t.track)}/2 = ${f3(t.outerRadius)} m`,
          `ratio = ${f3(t.innerRadius)} / ${f3(t.outerRadius)} = ${t.wheelSpeedRatio.toFixed(3)}`,
        ].join('\n'),
      }),
    ];
  },
};
