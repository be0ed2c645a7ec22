import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

export const innerWheel = defineRule({
  id: 'turn.inner-wheel',
  title: 'The inner wheel rolls forward in the planned turn',
  checks: "The inner wheel's path radius in the tightest planned turn is not below zero; below it the inner wheel runs backwards and scrubs, twisting the axle arm and the nave.",
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-turning'],
  needs: ['turn'],
  limits: { inner_radius_m: { direction: 'min', unit: 'm', levels: { hard: 'warning' } } },
  params: [],
  messages: {
    forward: { code: 2612, text: 'In the planned turn both wheels roll forward: inner path {inner:m}, outer {outer:m}, speed ratio {ratio:1}.' },
    backward: { code: 2611, text: 'In the planned turn the inner wheel runs backwards (path radius {inner:m}; outer {outer:m}; speed ratio {ratio:1}): it scrubs sideways instead of rolling.' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    if (!t.steady || t.wheelSpeedRatio === null) return; // turn.pole-reach says why
    ctx.report({
      subject: 'turn.design',
      label: `turn on a ${num(t.yokeRadius)} m yoke path`,
      message: { pass: 'forward', warning: 'backward' },
      params: { inner: t.innerRadius, outer: t.outerRadius, ratio: t.wheelSpeedRatio },
      value: t.innerRadius,
      unit: 'm',
      against: { limit: 'inner_radius_m' },
      load_case: 'turn',
      combination: null,
      fix: 'Plan a wider turn; a turn this tight can only be made at a walk, with the inner wheel dragged round.',
      working: [
        step('R_inner = R_a − t/2', `${num(t.axleRadius)} − ${num(t.track)}/2`, t.innerRadius, 'm'),
        step('R_outer = R_a + t/2', `${num(t.axleRadius)} + ${num(t.track)}/2`, t.outerRadius, 'm'),
        step('wheel speed ratio = R_inner / R_outer', `${num(t.innerRadius)} / ${num(t.outerRadius)}`, t.wheelSpeedRatio, '1'),
      ],
    });
  },
});
