import { governing } from '../../model/joint-force.ts';
import { strandPull, tensileCapacity } from '../../model/lashing-capacity.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { withinLimit } from '../within-limit.ts';
import { bumpLine, caseName, DEMAND_UNKNOWN, demandSourceIds, forceWorking, jointSubject, lashingLabel, lashingText, loadCaseOf, loadedLashings } from './lashed-joint.ts';

export const lashingTension = defineRule({
  id: 'lashing.tension',
  title: 'Lashing strength',
  checks: "Each lashing's largest joint force, or its own pretension where that is more, against the strands' tensile capacity 2 n b t f_t / SF, at the wet strength where the chariot is driven wet.",
  kind: 'check',
  method: ['design-basis-lashings'],
  needs: ['lashingDemands', 'bumpFactors'],
  limits: { utilisation: { direction: 'max', unit: 'of the tensile capacity 2 n b t f_t / SF' } },
  params: ['safety_factor'],
  messages: {
    within: { code: 2501, text: 'The {joint} lashing carries at most {value:N} ({case}), {share:%} of its tensile capacity of {capacity:N} at the {state} strength.' },
    over: { code: 2502, text: 'The {joint} lashing would carry {value:N} ({case}), more than its limit of {limit:N}: its tensile capacity at the {state} strength with a safety factor of {sf:1} is {capacity:N}.' },
    demandUnknown: DEMAND_UNKNOWN,
  },
  run(ctx) {
    const sf = ctx.param('safety_factor');
    const lim = ctx.limit('utilisation');
    const wet = ctx.spec.operation.wet;
    const bump = ctx.models.bumpFactors.crew;
    for (const { l, d } of loadedLashings(ctx.spec.lashings, ctx.models.lashingDemands, (r) => ctx.report(r))) {
      const leather = ctx.data.leathers[l.material];
      const dry = leather.tensile_strength_MPa.value;
      const wf = leather.wet_strength_factor.value;
      const ft = wet ? dry * wf : dry;
      const capacity = tensileCapacity(l, ft, sf.value);
      const gov = governing(d.cases, 'held_N');
      const F = gov?.held_N ?? 0;
      const pull = strandPull(F, l.wraps, l.pretension_N);
      const byPretension = pull > F;
      ctx.report({
        subject: jointSubject(l.joint),
        label: lashingLabel(l),
        message: { pass: 'within', fail: 'over' },
        params: { joint: l.joint, case: byPretension || !gov ? 'its own pretension' : caseName(d, gov), state: wet ? 'wet' : 'dry', capacity, share: pull / capacity, sf: sf.value },
        value: pull,
        unit: 'N',
        against: { limit: 'utilisation', times: capacity },
        sources: [...sf.sources, ...leather.tensile_strength_MPa.sources, ...(wet ? leather.wet_strength_factor.sources : []), ...demandSourceIds(ctx.data, bump)],
        load_case: byPretension ? null : loadCaseOf(d, gov),
        fix: withinLimit(pull, lim, capacity)
          ? 'None needed; test strips of your own hide to confirm the strength.'
          : `Add wraps, use a wider or thicker strap or a stronger leather${wet ? ', or keep the lashing dry' : ''}; ${byPretension ? 'or lay the wraps less tight' : 'or take part of the load with a peg or notch'}.`,
        working: [
          `${l.joint}: ${d.where}; ${lashingText(l)}`,
          bumpLine(bump),
          ...forceWorking(d, gov, 'held_N'),
          step('F, the largest force held', '', F, 'N'),
          step('strand pull = max(F, 2·n·T_pre)', `max(${num(F)}, 2 × ${l.wraps} × ${num(l.pretension_N)})`, pull, 'N'),
          "the strands hold their pretension until the members part, the joint force after; the whole force is taken by the strands, the safe side; T_pre is the builder's estimate",
          wet ? step(`f_t = f_t,dry × wet factor (${l.material}, wet)`, `${num(dry)} × ${num(wf)}`, ft, 'MPa') : step(`f_t (${l.material}, dry)`, '', ft, 'MPa'),
          step('capacity = 2·n·b·t·f_t / SF', `2 × ${l.wraps} × ${num(l.width_mm)} × ${num(l.thickness_mm)} × ${num(ft)} / ${num(sf.value)}`, capacity, 'N'),
          ...(lim.hard === null ? [] : [step('limit = hard level × capacity', `${num(lim.hard)} × ${num(capacity)}`, lim.hard * capacity, 'N')]),
          step('strand pull / capacity', `${num(pull)} / ${num(capacity)}`, pull / capacity, '1'),
        ],
      });
    }
  },
});
