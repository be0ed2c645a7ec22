import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { G } from '../../units/units.ts';

export const sliding = defineRule({
  id: 'turn.sliding',
  title: 'Sideways sliding in the planned turn',
  checks: "The lateral acceleration of the design turn against fractions of the ground's sliding threshold mu×g, and whether on this ground the chariot slides before it tips.",
  kind: 'check',
  method: ['design-basis-turning'],
  needs: ['turn'],
  limits: { lateral_fraction: { direction: 'max', unit: 'of the sliding threshold mu·g' } },
  params: [],
  messages: {
    within: { code: 2632, text: 'The design turn needs {value:m/s²} sideways on {ground} (mu = {mu:1}), within the advisory {advisory:m/s²}; {order}.' },
    over: { code: 2631, text: 'The design turn needs {value:m/s²} sideways on {ground} (mu = {mu:1}); the advisory limit is {advisory:m/s²} and the hard limit {hard:m/s²}; {order}.' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    if (!t.steady) return;
    const ground = ctx.data.grounds[ctx.spec.operation.ground];
    const slidesFirst = t.lateralFriction < t.ssf;
    ctx.report({
      subject: 'turn.design',
      label: `${num(ctx.spec.operation.speed_kmh)} km/h on ${ground.name}`,
      message: { pass: 'within', warning: 'over', fail: 'over' },
      params: { ground: ground.name, mu: t.lateralFriction, order: slidesFirst ? 'it slides before it tips (mu < SSF)' : 'it tips before it slides (mu ≥ SSF)' },
      value: t.lateralAccel,
      unit: 'm/s²',
      against: { limit: 'lateral_fraction', times: t.slideAccel },
      sources: ground.lateral_friction.sources,
      load_case: 'turn',
      fix: 'Slow down or widen the turn; on loose or wet ground a sliding wheel can catch a rut and throw the chariot over.',
      working: [
        step('a_slide = mu·g', `${num(t.lateralFriction)} × ${num(G)}`, t.slideAccel, 'm/s²'),
        `SSF = ${num(t.ssf)}: ${slidesFirst ? 'mu < SSF, it slides first' : 'mu ≥ SSF, it tips first'}`,
        step('a_lat', '', t.lateralAccel, 'm/s²'),
      ],
    });
  },
});
