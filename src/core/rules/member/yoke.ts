import type { Rule } from '../../engine/rule.ts';
import { centreLoadMoment, uniformLoadMoment } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { G } from '../../units/units.ts';
import { kModBasis, memberFinding, type CaseCheck } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

export const yokeMember: Rule = {
  id: 'member.yoke',
  title: 'Yoke strength',
  checks: 'Bending of the yoke as a beam on the two necks with the pole load at the middle, standing, over a bump, accelerating, braking and in a stopping shock, against the design strength of the yoke timber.',
  kind: 'check',
  limits: ['utilisation_max'],
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'yoke');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    const s = spec.yoke.neck_spacing_mm;
    const S = rectangle(spec.yoke.width_mm, spec.yoke.height_mm);
    const yokeMass = ctx.analysis.mass.yoke.mass_kg;
    const w = (yokeMass * G) / spec.yoke.length_mm; // own weight, N/mm
    const checks: CaseCheck[] = ctx.analysis.memberCases
      .filter((c) => c.id !== 'turn')
      .map((c) => {
        const fm = bending.design(c.duration);
        const own = uniformLoadMoment(w * c.gravityFactor, s);
        const Mc = centreLoadMoment(c.pole_N, s) + own;
        return { memberCase: c, mode: 'bending between the necks', demand: Mc / S.W, capacity: fm.value, basis: kModBasis(fm.kMod, c.duration), sources: [fm.kModSource], line: `M = R_pole·s/4 + w·s²/8 = ${f(c.pole_N, 1)} × ${s}/4 + ${f(w * c.gravityFactor, 5)} × ${s}²/8 = ${f(Mc / 1000, 1)} N·m; σ = M/W = ${f(Mc / S.W)} MPa; ${fm.line}` };
      });
    const intro = [
      `necks s = ${s} mm apart; ${S.label} (width × height), W = b·h²/6 = ${f(S.W, 0)} mm³; own weight w = ${f(yokeMass, 2)} kg × ${G} / ${spec.yoke.length_mm} mm = ${f(w, 5)} N/mm, taken over the span alone (the overhangs, which relieve it, are left out)`,
      ...bending.working,
    ];
    return [memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks, umax: ctx.limit('utilisation_max'), intro, sources: bending.sources, fix: 'Deepen the yoke at the middle, bring the necks closer (a narrower pair), reduce the pole load by moving the axle forward, or use a stronger species or selected stock.' })];
  },
};
