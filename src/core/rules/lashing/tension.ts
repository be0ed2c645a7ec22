import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { governing } from '../../model/joint-force.ts';
import { strandPull, tensileCapacity } from '../../model/lashing-capacity.ts';
import { demandSources } from '../../model/lashing-demand.ts';
import { caseList, demandUnknown, lashingSize, lashingSubject } from './lashed-joint.ts';

const f1 = (v: number) => v.toFixed(1);

export const lashingTension: Rule = {
  id: 'lashing.tension',
  title: 'Lashing strength',
  checks: "Each lashing's largest joint force, or its own pretension where that is more, against the strands' tensile capacity 2 n b t f_t / SF, at the wet strength where the chariot is driven wet.",
  kind: 'check',
  limits: ['safety_factor'],
  run(ctx) {
    const sf = ctx.limit('safety_factor');
    const wet = ctx.spec.operation.wet;
    return ctx.spec.lashings.map((l) => {
      const d = ctx.analysis.lashingDemands[l.joint];
      if (d.unknown !== null) return demandUnknown(this.id, l, d);
      const leather = ctx.data.leathers[l.material];
      const dry = leather.tensile_strength_MPa.value;
      const ft = wet ? dry * leather.wet_strength_factor.value : dry;
      const capacity = tensileCapacity(l, ft, sf.value);
      const gov = governing(d.cases, 'held_N');
      const F = gov?.held_N ?? 0;
      const pull = strandPull(F, l.wraps, l.pretension_N);
      const severity = pull > capacity ? 'fail' : 'pass';
      const byPretension = pull > F;
      const state = wet ? 'wet' : 'dry';
      return makeFinding(this.id, {
        severity,
        subject: lashingSubject(l),
        value: pull,
        unit: 'N',
        limit: capacity,
        message: severity === 'pass' ? 'lashingTensionWithin' : 'lashingTensionOver',
        params: { joint: l.joint, value: pull.toFixed(0), case: byPretension ? 'its own pretension' : gov!.title, state, limit: capacity.toFixed(0), sf: sf.value },
        fix: severity === 'pass'
          ? 'None needed; test strips of your own hide to confirm the strength.'
          : `Add wraps, use a wider or thicker strap or a stronger leather${wet ? ', or keep the lashing dry' : ''}; ${byPretension ? 'or lay the wraps less tight' : 'or take part of the load with a peg or notch'}.`,
        source: `${sf.source}; strength: ${leather.tensile_strength_MPa.source}${wet ? `; wet: ${leather.wet_strength_factor.source}` : ''}; ${demandSources(ctx.data, ctx.analysis.bumpFactors.crew)}`,
        working: [
          `${l.joint}: ${d.where}; ${l.wraps} wraps of ${l.material} ${lashingSize(l)} mm`,
          ...(gov ? [gov.working, caseList(d, 'held_N')] : ['no load reaches this joint']),
          `strand pull = max(F, 2·n·T_pre) = max(${f1(F)}, 2 × ${l.wraps} × ${l.pretension_N}) = ${f1(pull)} N (the strands hold their pretension until the members part, the joint force after; the whole force is taken by the strands, the safe side; T_pre is the builder's estimate)`,
          wet ? `f_t = ${dry} MPa × wet factor ${leather.wet_strength_factor.value} = ${f1(ft)} MPa (${l.material}, wet)` : `f_t = ${dry} MPa (${l.material}, dry)`,
          `capacity = 2·n·b·t·f_t / SF = 2 × ${l.wraps} × ${l.width_mm} mm × ${l.thickness_mm} mm × ${f1(ft)} MPa / ${sf.value} = ${f1(capacity)} N`,
          `utilisation = ${f1(pull)} / ${f1(capacity)} = ${(pull / capacity).toFixed(3)}`,
        ].join('\n'),
      });
    });
  },
};
