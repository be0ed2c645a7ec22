import { capstanHold, turnsToHold } from '../../model/capstan.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { withinLimit } from '../within-limit.ts';
import { jointSubject, lashingLabel, lashingText } from './lashed-joint.ts';

// The end must hold the strap's whole breaking pull, so that the end is never
// the weaker part, whatever the joint's demand turns out to be.

export const lashingAnchorage = defineRule({
  id: 'lashing.anchorage',
  title: 'Lashing ends',
  checks: "The full turns each lashing end needs round a member before it is tucked to hold the strap's breaking pull by the capstan equation, against the turns the specification gives.",
  kind: 'check',
  method: ['design-basis-lashings'],
  needs: [],
  limits: { turns: { direction: 'min', unit: 'of the turns needed' } },
  params: ['tail_tension_N'],
  messages: {
    within: { code: 2521, text: 'Each end of the {joint} lashing needs {need:1} full turns round a member before it is tucked; {value:1} are given.' },
    short: { code: 2522, text: "Each end of the {joint} lashing needs {need:1} full turns round a member before it is tucked to hold the strap's breaking pull of {pull:N}; only {value:1} are given." },
    note: { code: 2523, text: "Each end of the {joint} lashing needs at least {need:1} full turns round a member before it is tucked to hold the strap's breaking pull of {pull:N}; give anchor_turns to have it checked." },
  },
  run(ctx) {
    const tail = ctx.param('tail_tension_N');
    const lim = ctx.limit('turns');
    for (const l of ctx.spec.lashings) {
      const leather = ctx.data.leathers[l.material];
      const mu = leather.friction_on_wood.static;
      const ft = leather.tensile_strength_MPa.value;
      const pull = l.width_mm * l.thickness_mm * ft;
      const need = turnsToHold(pull, tail.value, mu.value);
      const given = l.anchor_turns;
      const common = {
        subject: jointSubject(l.joint),
        label: lashingLabel(l),
        params: { joint: l.joint, need, pull },
        sources: [...tail.sources, ...mu.sources, ...leather.tensile_strength_MPa.sources],
      };
      const working = [
        `${l.joint}: ${lashingText(l)}`,
        step("T = b·t·f_t (the strap's dry breaking pull)", `${num(l.width_mm)} × ${num(l.thickness_mm)} × ${num(ft)}`, pull, 'N'),
        step('turns needed = ln(T / T_tail) / (2π·mu)', `ln(${num(pull)} / ${num(tail.value)}) / (2π × ${num(mu.value)})`, need, '1'),
      ];
      if (given === undefined) {
        ctx.report({
          ...common,
          message: 'note',
          unit: 'turns',
          severity: 'advice',
          fix: `Take at least ${Math.ceil(need)} full turns before tucking each end, and give anchor_turns for this lashing.`,
          working: [...working, 'anchor_turns not given'],
        });
        continue;
      }
      ctx.report({
        ...common,
        message: { pass: 'within', fail: 'short' },
        value: given,
        unit: 'turns',
        against: { limit: 'turns', times: need },
        fix: withinLimit(given, lim, need) ? 'None needed.' : 'Take more full turns round the member before tucking the end, or finish it with a hitch.',
        working: [
          ...working,
          step('the turns given hold T_tail·e^(2π·mu·turns)', `${num(tail.value)} × e^(2π × ${num(mu.value)} × ${num(given)})`, capstanHold(tail.value, mu.value, given), 'N'),
          ...(lim.hard === null ? [] : [step('least turns = hard level × turns needed', `${num(lim.hard)} × ${num(need)}`, lim.hard * need, '1')]),
          step('turns needed / turns given', `${num(need)} / ${num(given)}`, given > 0 ? need / given : null, '1'),
        ],
      });
    }
  },
});
