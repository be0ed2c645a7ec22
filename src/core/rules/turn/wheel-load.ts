import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

export const wheelLoad = defineRule({
  id: 'turn.wheel-load',
  title: 'Wheel loads in the planned turn',
  checks: 'The load transfer from the inner to the outer wheel in the design turn, the wheel loads and the lateral force on each wheel; it warns when the inner wheel is left with too small a share of its static load to steer the axle.',
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-turning'],
  needs: ['turn'],
  limits: { inner_share: { direction: 'min', unit: 'of the static wheel load', levels: { hard: 'warning' } } },
  params: [],
  messages: {
    loads: { code: 2642, text: 'In the design turn the outer wheel carries {outer:N} and the inner {inner:N} ({value:%} of static); lateral forces {outerLateral:N} and {innerLateral:N}.' },
    light: { code: 2641, text: 'In the design turn the inner wheel keeps only {value:%} of its static load ({inner:N}; outer {outer:N}), below the {hard:%} it needs to steer the axle: it is close to lifting.' },
    lifts: { code: 2643, text: 'In the design turn the inner wheel lifts: the load transfer leaves it {inner:N} ({value:%} of static; outer {outer:N}).' },
  },
  run(ctx) {
    const t = ctx.models.turn;
    if (!t.steady) return;
    const half = t.wheelsLoad / 2;
    const share = t.innerWheel / half;
    ctx.report({
      subject: 'turn.design',
      label: `${num(ctx.spec.operation.speed_kmh)} km/h on a ${num(t.yokeRadius)} m yoke path`,
      message: { pass: 'loads', warning: t.innerWheel < 0 ? 'lifts' : 'light' },
      params: { outer: t.outerWheel, inner: t.innerWheel, outerLateral: t.outerLateral, innerLateral: t.innerLateral },
      value: share,
      unit: 'of static',
      against: { limit: 'inner_share' },
      load_case: 'turn',
      combination: 'characteristic',
      fix: 'Slow down or widen the turn; widen the track or lower the crew. The member rules use these loads for the design turn.',
      working: [
        step('dN = m·a_lat·h_g / t', `${num(t.mass)} × ${num(t.lateralAccel)} × ${num(t.cgHeight)} / ${num(t.track)}`, t.loadTransfer, 'N'),
        step('N_outer = N/2 + dN', `${num(half)} + ${num(t.loadTransfer)}`, t.outerWheel, 'N'),
        step('N_inner = N/2 − dN', `${num(half)} − ${num(t.loadTransfer)}`, t.innerWheel, 'N'),
        step('lateral force m·a_lat, shared in proportion to wheel load', `${num(t.mass)} × ${num(t.lateralAccel)}`, t.mass * t.lateralAccel, 'N'),
        step('inner share = N_inner / (N/2)', `${num(t.innerWheel)} / ${num(half)}`, share, '1'),
      ],
    });
  },
});
