import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

export const yokeLift: Rule = {
  id: 'balance.yoke-lift',
  title: 'The yoke stays down on the horses',
  checks: 'In every load case (crew anywhere on the usable floor; standing, accelerating, braking) the pole presses down on the yoke.',
  kind: 'check',
  limits: ['lift_N', 'light_N'],
  run(ctx) {
    const cases = ctx.analysis.loadCases;
    const worst = cases.reduce((w, c) => (c.pole_load_N < w.pole_load_N ? c : w));
    const lift = ctx.limit('lift_N');
    const light = ctx.limit('light_N');
    const lifts = worst.pole_load_N < lift.value;
    const isLight = !lifts && worst.pole_load_N < light.value;
    const table = cases.map((c) => `  ${c.id.padEnd(28)} R_pole = ${c.pole_load_N.toFixed(1)} N`).join('\n');
    return [
      makeFinding(this.id, {
        severity: lifts ? 'fail' : isLight ? 'advice' : 'pass',
        subject: worst.title,
        value: worst.pole_load_N,
        unit: 'N',
        limit: lifts ? lift.value : light.value,
        message: lifts ? 'yokeLifts' : 'yokePresses',
        params: { case: worst.title, value: Math.abs(worst.pole_load_N).toFixed(0) },
        fix: lifts
          ? 'Move the axle back (towards the rear edge), move the crew or the load forward, or lower the yoke point so the loaded centre of mass stands ahead of the axle in every case.'
          : isLight
            ? 'The yoke only just rests on the necks in this case; a little more weight ahead of the axle keeps it from bouncing.'
            : 'None needed.',
        source: lifts ? lift.source : light.source,
        working: `Least pole load over all load cases:\n${table}\nGoverning case, ${worst.id}:\n${worst.working}\nlifts when R_pole < ${lift.value} N; light below ${light.value} N`,
      }),
    ];
  },
};
