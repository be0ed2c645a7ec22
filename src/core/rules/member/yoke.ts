import { centreLoadMoment, uniformLoadMoment } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { G } from '../../units/units.ts';
import { strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { STRESS_MESSAGES } from './member-messages.ts';

export const yokeMember = defineRule({
  id: 'member.yoke',
  title: 'Yoke strength',
  checks: 'Bending of the yoke as a beam on the two necks with the pole load at the middle, standing, over a bump, accelerating, braking and in a stopping shock, against the design strength of the yoke timber.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials'],
  needs: ['mass', 'memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: [],
  messages: STRESS_MESSAGES,
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'yoke');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    const s = spec.yoke.neck_spacing_mm;
    const S = rectangle(spec.yoke.width_mm, spec.yoke.height_mm);
    const yokeMass = ctx.models.mass.yoke.mass_kg;
    const w = (yokeMass * G) / spec.yoke.length_mm; // own weight, N/mm
    const checks: CaseCheck[] = ctx.models.memberCases
      .filter((c) => c.id !== 'turn')
      .map((c) => {
        const fm = bending.design(c.duration, c.gammaM);
        const wc = w * c.gravityFactor;
        const Mc = centreLoadMoment(c.pole_N, s) + uniformLoadMoment(wc, s);
        return strengthCheck(c, 'bending between the necks', Mc / S.W, bending, fm, [
          step('M = R_pole·s/4 + w·s²/8', `${num(c.pole_N)} × ${num(s)}/4 + ${num(wc)} × ${num(s)}²/8`, Mc, 'N·mm'),
          step('σ = M/W', `${num(Mc)} / ${num(S.W)}`, Mc / S.W, 'MPa'),
        ]);
      });
    ctx.report(
      stressReport({
        subject: 'yoke',
        label: 'yoke between the necks',
        part: part.label,
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          step('s (neck spacing)', '', s, 'mm'),
          `${S.label} (width × height)`,
          step('W = b·h²/6', `${num(spec.yoke.width_mm)} × ${num(spec.yoke.height_mm)}²/6`, S.W, 'mm³'),
          step('w = m_yoke·g / yoke length', `${num(yokeMass)} × ${num(G)} / ${num(spec.yoke.length_mm)}`, w, 'N/mm'),
          'own weight taken over the span alone (the overhangs, which relieve it, are left out); in the bump case times the bump factor',
          ...bending.working,
        ],
        sources: bending.sourceIds,
        fix: 'Deepen the yoke at the middle, bring the necks closer (a narrower pair), reduce the pole load by moving the axle forward, or use a stronger species or selected stock.',
      }),
    );
  },
});
