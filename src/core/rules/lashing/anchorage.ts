import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { capstanHold, turnsToHold } from '../../model/capstan.ts';
import { lashingSize, lashingSubject } from './lashed-joint.ts';

const f1 = (v: number) => v.toFixed(1);
const f2 = (v: number) => v.toFixed(2);

// The end must hold the strap's whole breaking pull, so that the end is never
// the weaker part, whatever the joint's demand turns out to be.

export const lashingAnchorage: Rule = {
  id: 'lashing.anchorage',
  title: 'Lashing ends',
  checks: "The full turns each lashing end needs round a member before it is tucked to hold the strap's breaking pull by the capstan equation, against the turns the specification gives.",
  kind: 'check',
  limits: ['tail_tension_N'],
  run(ctx) {
    const tail = ctx.limit('tail_tension_N');
    return ctx.spec.lashings.map((l) => {
      const leather = ctx.data.leathers[l.material];
      const mu = leather.friction_on_wood.static;
      const ft = leather.tensile_strength_MPa.value;
      const pull = l.width_mm * l.thickness_mm * ft;
      const need = turnsToHold(pull, tail.value, mu.value);
      const given = l.anchor_turns;
      const severity = given === undefined ? 'advice' : need > given ? 'fail' : 'pass';
      const lines = [
        `${l.joint}: ${l.material} ${lashingSize(l)} mm`,
        `T = b·t·f_t = ${l.width_mm} mm × ${l.thickness_mm} mm × ${ft} MPa = ${f1(pull)} N (the strap's dry breaking pull)`,
        `turns = ln(T / T_tail) / (2π·mu) = ln(${f1(pull)} / ${tail.value}) / (2π × ${mu.value}) = ${f2(need)}`,
        ...(given === undefined
          ? ['anchor_turns not given']
          : [`given ${given} turns hold T_tail·e^(2π·mu·turns) = ${tail.value} × e^(2π × ${mu.value} × ${given}) = ${f1(capstanHold(tail.value, mu.value, given))} N`, `utilisation = ${f2(need)} / ${given} = ${given > 0 ? (need / given).toFixed(3) : '∞'}`]),
      ];
      return makeFinding(this.id, {
        severity,
        subject: lashingSubject(l),
        value: need,
        unit: 'turns',
        limit: given ?? null,
        message: given === undefined ? 'anchorageNote' : severity === 'pass' ? 'anchorageWithin' : 'anchorageShort',
        params: { joint: l.joint, value: f2(need), limit: given ?? '', pull: pull.toFixed(0) },
        fix: severity === 'fail'
          ? 'Take more full turns round the member before tucking the end, or finish it with a hitch.'
          : given === undefined
            ? `Take at least ${Math.ceil(need)} full turns before tucking each end, and give anchor_turns for this lashing.`
            : 'None needed.',
        source: `${tail.source}; friction: ${mu.source}; strength: ${leather.tensile_strength_MPa.source}`,
        working: lines.join('\n'),
      });
    });
  },
};
