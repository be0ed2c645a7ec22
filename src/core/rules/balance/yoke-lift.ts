import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

export const yokeLift = defineRule({
  id: 'balance.yoke-lift',
  title: 'The yoke stays down on the horses',
  checks: 'In every load case (crew anywhere on the usable floor; standing, accelerating, braking) the pole presses down on the yoke, with the EQU partial factors on what lifts it and on what holds it down.',
  kind: 'check',
  method: ['design-basis-balance', 'en-1990-a1-2a'],
  needs: ['loadCases'],
  limits: { pole_load: { direction: 'min', unit: 'N', levels: { advisory: 'advice', hard: 'fail' } } },
  params: [],
  messages: {
    lifts: { code: 2001, text: 'The yoke lifts off the horses in the case "{case}": the pole pulls up with {lift:N}.' },
    presses: { code: 2002, text: 'The yoke presses down in every load case; least pole load {value:N} ({case}).' },
    light: { code: 2003, text: 'The yoke only just rests on the horses in the case "{case}": least pole load {value:N}, below the {advisory:N} a firmly seated yoke needs.' },
  },
  run(ctx) {
    const cases = ctx.models.loadCases;
    // Equilibrium (EQU): what lifts the yoke × 1.1 (own weight) or 1.5 (crew, braking), what holds it down × 0.9 or left out.
    const worst = cases.reduce((w, c) => (c.pole_load_equ_N < w.pole_load_equ_N ? c : w));
    ctx.report({
      subject: `case.${worst.id}`,
      label: worst.title,
      message: { pass: 'presses', advice: 'light', fail: 'lifts' },
      params: { case: worst.title, lift: Math.max(0, -worst.pole_load_equ_N) },
      value: worst.pole_load_equ_N,
      unit: 'N',
      against: { limit: 'pole_load' },
      load_case: worst.id,
      combination: 'equilibrium',
      fix:
        worst.pole_load_equ_N < (ctx.limit('pole_load').hard ?? 0)
          ? 'Move the axle back (towards the rear edge), move the crew or the load forward, or lower the yoke point so the loaded centre of mass stands ahead of the axle in every case.'
          : 'A little more weight ahead of the axle keeps a lightly seated yoke from bouncing; none needed where the rule passes.',
      working: [
        'least pole load over all load cases with the EQU factors (the pole presses down where R_pole > 0)',
        ...cases.map((c) => step(`R_pole,EQU, ${c.title}`, '', c.pole_load_equ_N, 'N')),
        `governing case ${worst.id}:`,
        ...worst.working_equ.split('\n'),
        step('R_pole,min (EQU)', num(worst.pole_load_equ_N, 'N'), worst.pole_load_equ_N, 'N'),
        step(`for comparison, unfactored R_pole, ${worst.title}`, '', worst.pole_load_N, 'N'),
      ],
    });
  },
});
