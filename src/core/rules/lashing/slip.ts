import { slipCapacity } from '../../model/lashing-capacity.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { withinLimit } from '../within-limit.ts';
import { factorLines, caseName, DEMAND_UNKNOWN, demandSourceIds, designValue, forceWorking, governingDesign, jointSubject, lashingLabel, lashingText, loadCaseOf, loadedLashings } from './lashed-joint.ts';

export const lashingSlip = defineRule({
  id: 'lashing.slip',
  title: 'Lashed joints sliding',
  checks: "Each lashed joint's largest design force in the contact face (× 1.5 in the fundamental combination, × 1.0 for the stone and the stopping shock) against the friction of the clamp its wraps make, mu × 2 n T_pre, with the builder's estimated pretension.",
  kind: 'check',
  method: ['design-basis-lashings'],
  needs: ['lashingDemands', 'bumpFactors', 'stoneFactors'],
  limits: { utilisation: { direction: 'max', unit: 'of the clamp friction mu·2·n·T_pre' } },
  params: ['friction_wood_on_wood'],
  messages: {
    within: { code: 2511, text: "The {joint} lashing clamps with {capacity:N} of friction against at most {value:N} of sliding force ({case}), with the builder's estimated pretension of {pre:N} per wrap." },
    over: { code: 2512, text: "The {joint} joint may slip: {value:N} of sliding force ({case}) against {capacity:N} of clamp friction; the advisory limit is {advisory:N} and the hard limit {hard:N}, with the builder's estimated pretension of {pre:N} per wrap." },
    demandUnknown: DEMAND_UNKNOWN,
    noClamp: { code: 2513, text: 'The {joint} lashing is laid without pretension, so its wraps clamp with no friction: the joint holds {value:N} of sliding force ({case}) only by what else stops it sliding.' },
  },
  run(ctx) {
    const mu = ctx.param('friction_wood_on_wood');
    const lim = ctx.limit('utilisation');
    const bump = ctx.models.bumpFactors.crew;
    const stone = ctx.models.stoneFactors.crew;
    for (const { l, d } of loadedLashings(ctx.spec.lashings, ctx.models.lashingDemands, (r) => ctx.report(r))) {
      const capacity = slipCapacity(mu.value, l.wraps, l.pretension_N);
      const gov = governingDesign(d.cases, 'shear_N');
      const V = gov ? designValue(gov, 'shear_N') : 0;
      if (capacity === 0) {
        // No clamp to compare with: a utilisation would divide by nothing.
        ctx.report({
          subject: jointSubject(l.joint),
          label: lashingLabel(l),
          message: 'noClamp',
          params: { joint: l.joint, case: gov ? caseName(d, gov) : 'no load' },
          value: V,
          unit: 'N',
          severity: V > 0 ? 'fail' : 'pass',
          sources: [...mu.sources, ...demandSourceIds(ctx.data, bump, stone)],
          load_case: loadCaseOf(d, gov),
          combination: gov?.combination ?? null,
          fix: 'Lay the wraps tight (rawhide laid wet shrinks tight as it dries) and state the pretension, or notch or peg the joint so it cannot slide.',
          working: [`${l.joint}: ${d.where}; ${lashingText(l)} at a pretension of 0 N`, ...forceWorking(d, gov, 'shear_N'), step('V_d, the largest design force in the contact face', '', V, 'N'), 'clamp friction = mu·2·n·T_pre = 0 with no pretension'],
        });
        continue;
      }
      const level = (name: string, v: number | null) => (v === null ? [] : [step(`${name} limit = fraction × clamp friction`, `${num(v)} × ${num(capacity)}`, v * capacity, 'N')]);
      ctx.report({
        subject: jointSubject(l.joint),
        label: lashingLabel(l),
        message: { pass: 'within', warning: 'over', fail: 'over' },
        params: { joint: l.joint, case: gov ? caseName(d, gov) : 'no load', capacity, pre: l.pretension_N },
        value: V,
        unit: 'N',
        against: { limit: 'utilisation', times: capacity },
        sources: [...mu.sources, ...demandSourceIds(ctx.data, bump, stone)],
        load_case: loadCaseOf(d, gov),
        combination: gov?.combination ?? null,
        fix: withinLimit(V, lim, capacity)
          ? 'None needed; the clamp relies on the pretension: retighten leather that has stretched.'
          : 'Add wraps or lay them tighter (rawhide laid wet shrinks tight as it dries), notch or peg the joint so it cannot slide, or measure the friction of your own timber.',
        working: [
          `${l.joint}: ${d.where}; ${lashingText(l)} at an estimated ${num(l.pretension_N, 'N')} N each`,
          ...factorLines(bump, stone),
          ...forceWorking(d, gov, 'shear_N'),
          step('V_d, the largest design force in the contact face', '', V, 'N'),
          step('clamp friction = mu·2·n·T_pre', `${num(mu.value)} × 2 × ${l.wraps} × ${num(l.pretension_N)}`, capacity, 'N'),
          "the friction of the members' own weight on each other is not counted, the safe side: a bump unloads it",
          ...level('advisory', lim.advisory),
          ...level('hard', lim.hard),
          ...(ctx.spec.operation.wet ? ['driven wet: leather and rawhide slacken when wet, so the estimated pretension may not hold'] : []),
          step('utilisation = V / clamp friction', `${num(V)} / ${num(capacity)}`, V / capacity, '1'),
        ],
      });
    }
  },
});
