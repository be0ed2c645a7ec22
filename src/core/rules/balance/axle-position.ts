import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { staticPoleLoad } from '../../model/load-cases.ts';

export const axlePosition: Rule = {
  id: 'balance.axle-position',
  title: 'Balance note: the centre of mass and the axle',
  checks: 'How far forward of the axle the loaded centre of mass stands, and what moving the axle forward or back by a trial step would do to the load on the horses.',
  kind: 'note',
  limits: ['step_mm'],
  run(ctx) {
    const { spec, data } = ctx;
    const step = ctx.limit('step_mm');
    const rolling = ctx.analysis.mass.rolling;
    const d = rolling.x_mm - spec.axle.x_mm;
    const here = staticPoleLoad(spec, data, ctx.analysis.mass).pole_N;
    const moved = (dx: number) => staticPoleLoad({ ...spec, axle: { ...spec.axle, x_mm: spec.axle.x_mm + dx } }, data).pole_N;
    const fwd = moved(step.value);
    const back = moved(-step.value);
    const signed = (v: number) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(0)}`;
    return [
      makeFinding(this.id, {
        severity: 'advice',
        subject: 'static, crew as placed',
        value: d,
        unit: 'mm',
        limit: null,
        message: 'balanceNote',
        params: { value: Math.abs(d).toFixed(0), side: d >= 0 ? 'forward of' : 'behind', fwd: signed(fwd - here), back: signed(back - here) },
        fix: 'Move the axle towards the floor centre to take weight off the horses, towards the rear edge to put weight on them.',
        source: step.source,
        working: [
          `x_g − x_a = ${rolling.x_mm.toFixed(1)} − ${spec.axle.x_mm} = ${d.toFixed(1)} mm (rolling assembly ${rolling.mass_kg.toFixed(1)} kg, crew as placed)`,
          `R_pole with the axle at ${spec.axle.x_mm} mm: ${here.toFixed(1)} N`,
          `R_pole with the axle at ${spec.axle.x_mm + step.value} mm (forward ${step.value}): ${fwd.toFixed(1)} N`,
          `R_pole with the axle at ${spec.axle.x_mm - step.value} mm (back ${step.value}): ${back.toFixed(1)} N`,
          '(the axle, the wheels and the lashings on the axle move with it; everything else stays)',
        ].join('\n'),
      }),
    ];
  },
};
