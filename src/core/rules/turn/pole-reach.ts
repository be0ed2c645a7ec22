import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

const f3 = (v: number) => v.toFixed(3);

export const poleReach: Rule = {
  id: 'turn.pole-reach',
  title: 'The planned turn is wider than the pole reaches',
  checks: "The yoke's path radius in the tightest planned turn is greater than the horizontal reach from the axle to the yoke, so the chariot can follow it in a steady turn.",
  kind: 'check',
  limits: ['least_margin_m'],
  run(ctx) {
    const t = ctx.analysis.turn;
    const lim = ctx.limit('least_margin_m');
    const margin = t.yokeRadius - t.reach;
    const ok = margin > lim.value;
    return [
      makeFinding(this.id, {
        severity: ok ? 'pass' : 'fail',
        subject: `turn on a ${t.yokeRadius} m yoke path`,
        value: t.yokeRadius,
        unit: 'm',
        limit: t.reach + lim.value,
        message: ok ? 'turnReachOk' : 'turnTooTight',
        params: { radius: t.yokeRadius, reach: f3(t.reach) },
        fix: ok ? 'None needed.' : 'Plan a wider turn, or shorten the pole (move the yoke back or the axle forward).',
        source: lim.source,
        working: [
          'L = x_y − x_a (horizontal axle-to-yoke reach)',
          `  = ${f3(t.reach)} m`,
          `steady turn needs R_y − L > ${lim.value} m: ${t.yokeRadius} − ${f3(t.reach)} = ${f3(margin)} m`,
          ok ? `axle path radius R_a = √(R_y² − L²) = √(${t.yokeRadius}² − ${f3(t.reach)}²) = ${f3(t.axleRadius)} m; off-tracking R_y − R_a = ${f3(t.offTracking)} m` : 'no steady turn: the axle cannot follow this circle',
        ].join('\n'),
      }),
    ];
  },
};
