import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

export const poleReach = defineRule({
  id: 'turn.pole-reach',
  title: 'The planned turn is wider than the pole reaches',
  checks: "The yoke's path radius in the tightest planned turn is greater than the horizontal reach from the axle to the yoke, so the chariot can follow it in a steady turn.",
  kind: 'check',
  method: ['design-basis-turning'],
  needs: ['turn'],
  limits: { margin_m: { direction: 'min', unit: 'm' } },
  params: [],
  messages: {
    wide: { code: 2602, text: 'The planned turn of {radius:m} is wider than the pole reach of {reach:m}, by {value:m}.' },
    tight: { code: 2601, text: 'The planned turn of {radius:m} is too tight: the yoke path must be wider than the pole reach of {reach:m}, or the chariot cannot follow it.' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    const margin = t.yokeRadius - t.reach;
    ctx.report({
      subject: 'turn.design',
      label: `turn on a ${num(t.yokeRadius)} m yoke path`,
      message: { pass: 'wide', fail: 'tight' },
      params: { radius: t.yokeRadius, reach: t.reach },
      value: margin,
      unit: 'm',
      against: { limit: 'margin_m' },
      load_case: 'turn',
      combination: null,
      fix: 'Plan a wider turn, or shorten the pole (move the yoke back or the axle forward).',
      working: [
        step('L = x_y − x_a (horizontal axle-to-yoke reach)', '', t.reach, 'm'),
        step('margin = R_y − L', `${num(t.yokeRadius)} − ${num(t.reach)}`, margin, 'm'),
        t.steady
          ? step('axle path radius R_a = √(R_y² − L²)', `√(${num(t.yokeRadius)}² − ${num(t.reach)}²)`, t.axleRadius, 'm')
          : 'no steady turn: the axle cannot follow this circle',
        ...(t.steady ? [step('off-tracking = R_y − R_a', `${num(t.yokeRadius)} − ${num(t.axleRadius)}`, t.offTracking, 'm')] : []),
      ],
    });
  },
});
