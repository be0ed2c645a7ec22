import { defineRule } from '../../pipeline/define-rule.ts';
import { staticPoleLoad } from '../../model/load-cases.ts';
import { num, step } from '../../pipeline/step.ts';

export const axlePosition = defineRule({
  id: 'balance.axle-position',
  title: 'Balance note: the centre of mass and the axle',
  checks: 'How far forward of the axle the loaded centre of mass stands, and what moving the axle forward or back by a trial step would do to the load on the horses.',
  kind: 'note',
  method: ['design-basis-balance'],
  needs: ['mass'],
  limits: {},
  params: ['step_mm'],
  messages: {
    note: { code: 2021, text: 'The loaded centre of mass stands {offset:mm} {side} the axle; moving the axle {step:mm} forward changes the static pole load by {forward:N}, {step:mm} back by {back:N}.' },
  },
  run(ctx) {
    const { spec, data } = ctx;
    const trial = ctx.param('step_mm');
    const rolling = ctx.models.mass.rolling;
    const d = rolling.x_mm - spec.axle.x_mm;
    const here = staticPoleLoad(spec, data, ctx.models.mass).pole_N;
    const moved = (dx: number) => staticPoleLoad({ ...spec, axle: { ...spec.axle, x_mm: spec.axle.x_mm + dx } }, data).pole_N;
    const fwd = moved(trial.value);
    const back = moved(-trial.value);
    ctx.report({
      subject: 'case.static',
      label: 'static, crew as placed',
      message: 'note',
      params: { offset: Math.abs(d), side: d >= 0 ? 'forward of' : 'behind', step: trial.value, forward: fwd - here, back: back - here },
      value: d,
      unit: 'mm',
      severity: 'info',
      sources: trial.sources,
      load_case: 'static',
      combination: 'characteristic',
      fix: 'Move the axle towards the floor centre to take weight off the horses, towards the rear edge to put weight on them.',
      working: [
        step('x_g − x_a', `${num(rolling.x_mm, 'mm')} − ${num(spec.axle.x_mm, 'mm')}`, d, 'mm'),
        step(`R_pole with the axle at ${num(spec.axle.x_mm, 'mm')} mm`, '', here, 'N'),
        step(`R_pole with the axle ${num(trial.value, 'mm')} mm forward`, '', fwd, 'N'),
        step(`R_pole with the axle ${num(trial.value, 'mm')} mm back`, '', back, 'N'),
        'the axle, the wheels and the lashings on the axle move with it; everything else stays',
      ],
    });
  },
});
