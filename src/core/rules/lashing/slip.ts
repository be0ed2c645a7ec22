import { gradeUpper, makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { governing } from '../../model/joint-force.ts';
import { slipCapacity } from '../../model/lashing-capacity.ts';
import { demandSources } from '../../model/lashing-demand.ts';
import { caseList, demandUnknown, lashingSize, lashingSubject } from './lashed-joint.ts';

const f1 = (v: number) => v.toFixed(1);

export const lashingSlip: Rule = {
  id: 'lashing.slip',
  title: 'Lashed joints sliding',
  checks: "Each lashed joint's largest force in the contact face against the friction of the clamp its wraps make, mu × 2 n T_pre, with the builder's estimated pretension.",
  kind: 'check',
  limits: ['friction_wood_on_wood', 'advisory_fraction'],
  run(ctx) {
    const mu = ctx.limit('friction_wood_on_wood');
    const adv = ctx.limit('advisory_fraction');
    return ctx.spec.lashings.map((l) => {
      const d = ctx.analysis.lashingDemands[l.joint];
      if (d.unknown !== null) return demandUnknown(this.id, l, d);
      const capacity = slipCapacity(mu.value, l.wraps, l.pretension_N);
      const advN = adv.value * capacity;
      const gov = governing(d.cases, 'shear_N');
      const V = gov?.shear_N ?? 0;
      const severity = gradeUpper(V, advN, capacity);
      const hard = severity === 'fail';
      const limitN = hard ? capacity : advN;
      return makeFinding(this.id, {
        severity,
        subject: lashingSubject(l),
        value: V,
        unit: 'N',
        limit: limitN,
        message: severity === 'pass' ? 'lashingSlipWithin' : 'lashingSlipOver',
        params: { joint: l.joint, value: V.toFixed(0), case: gov?.title ?? 'no load', limit: (severity === 'pass' ? capacity : limitN).toFixed(0), level: hard ? 'hard' : 'advisory', pre: l.pretension_N },
        fix: severity === 'pass'
          ? 'None needed; the clamp relies on the pretension: retighten leather that has stretched.'
          : 'Add wraps or lay them tighter (rawhide laid wet shrinks tight as it dries), notch or peg the joint so it cannot slide, or measure the friction of your own timber.',
        source: `${mu.source}; ${adv.source}; ${demandSources(ctx.data, ctx.analysis.bumpFactors.crew)}`,
        working: [
          `${l.joint}: ${d.where}; ${l.wraps} wraps of ${l.material} ${lashingSize(l)} mm at an estimated ${l.pretension_N} N each`,
          ...(gov ? [gov.working, caseList(d, 'shear_N')] : ['no load reaches this joint']),
          `slip capacity = mu·2·n·T_pre = ${mu.value} × 2 × ${l.wraps} × ${l.pretension_N} N = ${f1(capacity)} N (the friction of the members' own weight on each other is not counted, the safe side: a bump unloads it)`,
          `limits: advisory ${adv.value} × ${f1(capacity)} = ${f1(advN)} N, hard ${f1(capacity)} N`,
          ...(ctx.spec.operation.wet ? ['driven wet: leather and rawhide slacken when wet, so the estimated pretension may not hold'] : []),
          `utilisation = ${f1(V)} / ${f1(limitN)} = ${(V / limitN).toFixed(3)}`,
        ].join('\n'),
      });
    });
  },
};
