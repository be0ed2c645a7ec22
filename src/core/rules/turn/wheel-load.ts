import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

const f1 = (v: number) => v.toFixed(1);
const f3 = (v: number) => v.toFixed(3);

export const wheelLoad: Rule = {
  id: 'turn.wheel-load',
  title: 'Wheel loads in the planned turn',
  checks: 'The load transfer from the inner to the outer wheel in the design turn, the wheel loads and the lateral force on each wheel; it warns when the inner wheel is left with too small a share to steer the axle.',
  kind: 'note',
  limits: ['least_inner_share'],
  run(ctx) {
    const t = ctx.analysis.turn;
    if (!t.steady) return [];
    const lim = ctx.limit('least_inner_share');
    const share = t.innerWheel / (t.wheelsLoad / 2);
    const light = share < lim.value;
    return [
      makeFinding(this.id, {
        severity: light ? 'warning' : 'advice',
        subject: `${ctx.spec.operation.speed_kmh} km/h on a ${t.yokeRadius} m yoke path`,
        value: share,
        unit: 'of static',
        limit: lim.value,
        message: t.innerWheel < 0 ? 'innerWheelLifts' : light ? 'innerWheelLight' : 'wheelLoads',
        params: { outer: f1(t.outerWheel), inner: f1(t.innerWheel), outerLat: f1(t.outerLateral), innerLat: f1(t.innerLateral), share: (100 * share).toFixed(0) },
        fix: light ? 'Slow down or widen the turn; widen the track or lower the crew.' : 'None needed; the member rules use these loads for the design turn.',
        source: lim.source,
        working: [
          'dN = m·a_lat·h_g / t; N_outer = N/2 + dN; N_inner = N/2 − dN; lateral force shared in proportion to wheel load',
          `dN = ${f1(t.mass)} kg × ${f3(t.lateralAccel)} m/s² × ${f3(t.cgHeight)} m / ${f3(t.track)} m = ${f1(t.loadTransfer)} N`,
          `N = ${f1(t.wheelsLoad)} N (static axle load); N_outer = ${f1(t.wheelsLoad / 2)} + ${f1(t.loadTransfer)} = ${f1(t.outerWheel)} N; N_inner = ${f1(t.wheelsLoad / 2)} − ${f1(t.loadTransfer)} = ${f1(t.innerWheel)} N`,
          `lateral m·a_lat = ${f1(t.mass * t.lateralAccel)} N: outer ${f1(t.outerLateral)} N, inner ${f1(t.innerLateral)} N`,
          `inner share = ${f1(t.innerWheel)} / ${f1(t.wheelsLoad / 2)} = ${f3(share)} (limit ${lim.value})`,
        ].join('\n'),
      }),
    ];
  },
};
