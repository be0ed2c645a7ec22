import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { G } from '../../units/units.ts';
import { lateralLimits } from '../../model/turn-limits.ts';

export const sliding = defineRule({
  id: 'turn.sliding',
  title: 'Sideways sliding in the planned turn',
  checks: "The lateral acceleration of the design turn, times the EQU factor on a variable action, against the ground's sliding threshold mu×g times the EQU factor on a stabilising weight, and whether on this ground the chariot slides before it tips.",
  kind: 'check',
  method: ['design-basis-turning', 'en-1990-a1-2a'],
  needs: ['turn'],
  limits: { lateral_fraction: { direction: 'max', unit: 'of the sliding threshold mu·g × γ_G,stb' } },
  params: [],
  messages: {
    within: { code: 2634, text: 'The design turn needs {lateral:m/s²} sideways on {ground} (mu = {mu:1}); with the equilibrium factors, {value:m/s²} against {hard:m/s²}, within the advisory {advisory:m/s²}; {order}.' },
    over: { code: 2633, text: 'The design turn needs {lateral:m/s²} sideways on {ground} (mu = {mu:1}); with the equilibrium factors, {value:m/s²} against the advisory {advisory:m/s²} and the hard limit {hard:m/s²}; {order}.' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    if (!t.steady) return;
    const ground = ctx.data.grounds[ctx.spec.operation.ground];
    const slidesFirst = t.lateralFriction < t.ssf;
    const allowed = lateralLimits(ctx.data, t);
    ctx.report({
      subject: 'turn.design',
      label: `${num(ctx.spec.operation.speed_kmh)} km/h on ${ground.name}`,
      message: { pass: 'within', warning: 'over', fail: 'over' },
      params: { lateral: t.lateralAccel, ground: ground.name, mu: t.lateralFriction, order: slidesFirst ? 'it slides before it tips (mu < SSF)' : 'it tips before it slides (mu ≥ SSF)' },
      value: allowed.gammaQ * t.lateralAccel,
      unit: 'm/s²',
      against: { limit: 'lateral_fraction', times: allowed.gammaStb * t.slideAccel },
      sources: [...ground.lateral_friction.sources, ...allowed.sources],
      load_case: 'turn',
      combination: 'equilibrium',
      fix: 'Slow down or widen the turn; on loose or wet ground a sliding wheel can catch a rut and throw the chariot over.',
      working: [
        step('a_slide = mu·g', `${num(t.lateralFriction)} × ${num(G)}`, t.slideAccel, 'm/s²'),
        `SSF = ${num(t.ssf)}: ${slidesFirst ? 'mu < SSF, it slides first' : 'mu ≥ SSF, it tips first'}`,
        step('a_lat', '', t.lateralAccel, 'm/s²'),
        step('EQU: γ_Q·a_lat against γ_G,stb·mu·g', `${num(allowed.gammaQ)} × ${num(t.lateralAccel)} against ${num(allowed.gammaStb)} × ${num(t.slideAccel)}`, allowed.gammaQ * t.lateralAccel, 'm/s²'),
      ],
    });
  },
});
