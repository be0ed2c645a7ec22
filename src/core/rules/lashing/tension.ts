import { leatherDesignStrength } from '../../model/leather-strength.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { withinLimit } from '../within-limit.ts';
import { factorLines, caseName, DEMAND_UNKNOWN, demandSourceIds, designValue, forceWorking, jointSubject, lashingLabel, lashingText, loadCaseOf, loadedLashings } from './lashed-joint.ts';

export const lashingTension = defineRule({
  id: 'lashing.tension',
  title: 'Lashing strength',
  checks: "Each lashing's largest design joint force (the fundamental combination's 1.5, or 1.0 for the stone and the stopping shock), or its own pretension where that is more, against the strands' design capacity 2 n b t f_d, f_d from the one strength chain of leather and rawhide (wet where the chariot is driven wet).",
  kind: 'check',
  method: ['design-basis-lashings', 'design-basis-materials'],
  needs: ['lashingDemands', 'bumpFactors', 'stoneFactors'],
  limits: { utilisation: { direction: 'max', unit: 'of the design capacity 2 n b t f_d' } },
  params: [],
  messages: {
    within: { code: 2504, text: 'The {joint} lashing carries at most {value:N} ({case}, {combination}), {share:%} of its design capacity of {capacity:N} at the {state} strength.' },
    over: { code: 2505, text: 'The {joint} lashing would carry {value:N} ({case}, {combination}), more than its design capacity of {capacity:N} at the {state} strength.' },
    demandUnknown: DEMAND_UNKNOWN,
  },
  run(ctx) {
    const lim = ctx.limit('utilisation');
    const wet = ctx.spec.operation.wet;
    const bump = ctx.models.bumpFactors.crew;
    const stone = ctx.models.stoneFactors.crew;
    for (const { l, d } of loadedLashings(ctx.spec.lashings, ctx.models.lashingDemands, (r) => ctx.report(r))) {
      // Each case against the capacity of its own combination: the strands only wrap round, so no joint efficiency.
      const pretension = 2 * l.wraps * l.pretension_N;
      const checks = (d.cases.length > 0 ? d.cases : [undefined]).map((c) => {
        const combination = c?.combination ?? 'fundamental';
        const fd = leatherDesignStrength(ctx.data, l.material, { joint: false, wet, combination });
        const capacity = 2 * l.wraps * l.width_mm * l.thickness_mm * fd.value;
        const F = c ? designValue(c, 'held_N') : 0;
        const pull = Math.max(F, pretension);
        return { c, combination, fd, capacity, F, pull, ratio: pull / capacity };
      });
      const g = checks.reduce((w, x) => (x.ratio > w.ratio ? x : w));
      const byPretension = g.pull > g.F;
      ctx.report({
        subject: jointSubject(l.joint),
        label: lashingLabel(l),
        message: { pass: 'within', fail: 'over' },
        params: { joint: l.joint, case: byPretension || !g.c ? 'its own pretension' : caseName(d, g.c), combination: g.combination, state: wet ? 'wet' : 'dry', capacity: g.capacity, share: g.ratio },
        value: g.pull,
        unit: 'N',
        against: { limit: 'utilisation', times: g.capacity },
        sources: [...g.fd.sources, ...demandSourceIds(ctx.data, bump, stone)],
        load_case: byPretension ? 'pretension' : loadCaseOf(d, g.c),
        combination: g.combination,
        fix: withinLimit(g.pull, lim, g.capacity)
          ? 'None needed; test strips of your own hide to confirm the strength.'
          : `Add wraps, use a wider or thicker strap or a stronger leather${wet ? ', or keep the lashing dry' : ''}; ${byPretension ? 'or lay the wraps less tight' : 'or take part of the load with a peg or notch'}.`,
        working: [
          `${l.joint}: ${d.where}; ${lashingText(l)}`,
          ...factorLines(bump, stone),
          ...forceWorking(d, g.c, 'held_N'),
          step('F_d, the governing design force held', '', g.F, 'N'),
          step('strand pull = max(F_d, 2·n·T_pre)', `max(${num(g.F)}, 2 × ${l.wraps} × ${num(l.pretension_N)})`, g.pull, 'N'),
          "the strands hold their pretension until the members part, the joint force after; the whole force is taken by the strands, the safe side; T_pre is the builder's estimate",
          ...g.fd.steps,
          step('capacity = 2·n·b·t·f_d', `2 × ${l.wraps} × ${num(l.width_mm)} × ${num(l.thickness_mm)} × ${num(g.fd.value)}`, g.capacity, 'N'),
          step('strand pull / capacity', `${num(g.pull)} / ${num(g.capacity)}`, g.ratio, '1'),
        ],
      });
    }
  },
});
