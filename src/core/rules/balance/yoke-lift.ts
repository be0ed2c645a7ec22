import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

// Two questions, each in its own terms (design basis, section 3): does the yoke
// lift off the necks (an equilibrium limit state: the EQU factors on what
// lifts it and what holds it down, the crew's help left out), and does it sit
// firmly with the vehicle as driven (characteristic loads, advice only).

export const yokeLift = defineRule({
  id: 'balance.yoke-lift',
  title: 'The yoke stays down on the horses',
  checks: 'In every load case (crew anywhere on the usable floor; standing, accelerating, braking) the pole presses down on the yoke, with the EQU partial factors on what lifts it and on what holds it down; and, with the loads as they are, whether it rests firmly enough not to bounce.',
  kind: 'check',
  method: ['design-basis-balance', 'en-1990-a1-2a'],
  needs: ['loadCases'],
  limits: {
    pole_load: { direction: 'min', unit: 'N', levels: { hard: 'fail' } },
    seated_load: { direction: 'min', unit: 'N', levels: { advisory: 'advice' } },
  },
  params: [],
  messages: {
    lifts: { code: 2001, text: 'The yoke lifts off the horses in the case "{case}": the pole pulls up with {lift:N}.' },
    presses: { code: 2002, text: 'The yoke presses down in every load case; least pole load {value:N} ({case}).' },
    light: { code: 2003, text: 'The yoke only just rests on the horses in the case "{case}": least pole load {value:N}, below the {advisory:N} a firmly seated yoke needs.' },
    seated: { code: 2004, text: 'The yoke rests firmly in every load case as driven; least pole load {value:N} ({case}).' },
  },
  run(ctx) {
    const cases = ctx.models.loadCases;
    // Equilibrium (EQU): what lifts the yoke × 1.1 (own weight) or 1.5 (crew, braking), what holds it down × 0.9 or left out.
    const worst = cases.reduce((w, c) => (c.pole_load_equ_N < w.pole_load_equ_N ? c : w));
    ctx.report({
      subject: `case.${worst.id}`,
      label: worst.title,
      message: { pass: 'presses', fail: 'lifts' },
      params: { case: worst.title, lift: Math.max(0, -worst.pole_load_equ_N) },
      value: worst.pole_load_equ_N,
      unit: 'N',
      against: { limit: 'pole_load' },
      load_case: worst.id,
      combination: 'equilibrium',
      fix:
        worst.pole_load_equ_N < (ctx.limit('pole_load').hard ?? 0)
          ? 'Move the axle back (towards the rear edge), move the crew or the load forward, or lower the yoke point so the loaded centre of mass stands ahead of the axle in every case.'
          : 'None needed.',
      working: [
        'least pole load over all load cases with the EQU factors (the pole presses down where R_pole > 0)',
        ...cases.map((c) => step(`R_pole,EQU, ${c.title}`, '', c.pole_load_equ_N, 'N')),
        `governing case ${worst.id}:`,
        ...worst.working_equ.split('\n'),
        step('R_pole,min (EQU)', num(worst.pole_load_equ_N, 'N'), worst.pole_load_equ_N, 'N'),
      ],
    });
    // As driven: the least characteristic pole load, against the seating a yoke needs not to bounce on the necks.
    const light = cases.reduce((w, c) => (c.pole_load_N < w.pole_load_N ? c : w));
    const seat = ctx.limit('seated_load');
    ctx.report({
      subject: `case.${light.id}.seated`,
      label: `${light.title}, as driven`,
      message: { pass: 'seated', advice: 'light' },
      params: { case: light.title },
      value: light.pole_load_N,
      unit: 'N',
      against: { limit: 'seated_load' },
      load_case: light.id,
      combination: 'characteristic',
      fix:
        seat.advisory !== null && light.pole_load_N < seat.advisory
          ? 'A little more weight ahead of the axle (or the axle a little further back) keeps a lightly seated yoke from bouncing on the necks.'
          : 'None needed.',
      working: [
        'least pole load over all load cases, unfactored (the loads as they are when driven)',
        ...cases.map((c) => step(`R_pole, ${c.title}`, '', c.pole_load_N, 'N')),
        step('R_pole,min', num(light.pole_load_N, 'N'), light.pole_load_N, 'N'),
      ],
    });
  },
});
