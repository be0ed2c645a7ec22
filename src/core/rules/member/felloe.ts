import { centreLoadMoment } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { STRESS_MESSAGES } from './member-messages.ts';

/**
 * Grain run-out of a felloe sawn from straight stock: a segment of 360°/pieces
 * has straight grain along its chord, so at its ends the grain crosses the rim
 * at half the segment angle. A steam-bent felloe's grain follows the rim.
 */
export function felloeRunoutDeg(pieces: number, bent: boolean): number {
  return bent ? 0 : 180 / pieces;
}

export const felloeMember = defineRule({
  id: 'member.felloe',
  title: 'Felloe span strength',
  checks: 'Bending of the rim between two spokes, as a simply supported span with the wheel load at its middle, in every load case, against the design strength of the felloe timber with the grain run-out of sawn segments.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials'],
  needs: ['mass', 'memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: [],
  messages: STRESS_MESSAGES,
  run(ctx) {
    const { spec, data } = ctx;
    const w = spec.wheels;
    const lay = ctx.models.mass.layout;
    const bent = w.felloe.bend_radius_mm !== undefined;
    const runout = felloeRunoutDeg(w.felloe.pieces, bent);
    const part = timberPart(spec, 'felloe');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct, runout);
    const Rm = (lay.felloeInner + lay.felloeOuter) / 2;
    const span = (2 * Math.PI * Rm) / w.spokes;
    const S = rectangle(w.felloe.width_mm, w.felloe.depth_mm);
    const checks: CaseCheck[] = ctx.models.memberCases.map((c) => {
      const fm = bending.design(c.duration, c.gammaM);
      const Mc = centreLoadMoment(c.wheel_N, span);
      return strengthCheck(c, 'bending between spokes', Mc / S.W, bending, fm, [step('M = N_w·span/4', `${num(c.wheel_N)} × ${num(span)}/4`, Mc, 'N·mm'), step('σ = M/W', `${num(Mc)} / ${num(S.W)}`, Mc / S.W, 'MPa')]);
    });
    ctx.report(
      stressReport({
        subject: 'wheel.felloe',
        label: 'felloe between two spokes',
        part: part.label,
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          step("R_m (the felloe's mid-depth radius) = (R_inner + R_outer)/2", `(${num(lay.felloeInner)} + ${num(lay.felloeOuter)})/2`, Rm, 'mm'),
          step('span = 2π·R_m/n', `2π × ${num(Rm)} / ${num(w.spokes)}`, span, 'mm'),
          `${S.label} (width × depth)`,
          step('W = b·h²/6', `${num(w.felloe.width_mm)} × ${num(w.felloe.depth_mm)}²/6`, S.W, 'mm³'),
          bent ? 'steam-bent felloe: the grain follows the rim' : `sawn segments, ${w.felloe.pieces} to the rim`,
          ...(bent ? [] : [step('grain run-out at the segment ends = 180°/pieces', `180°/${num(w.felloe.pieces)}`, runout, '°')]),
          ...(!bent && part.grainSlopeDeg > 0 ? [step('plus the stated slope of grain', '', part.grainSlopeDeg, '°')] : []),
          ...bending.working,
        ],
        sources: bending.sourceIds,
        fix: bent
          ? 'Deepen the felloe, add spokes to shorten the span, or use a stronger species or selected stock.'
          : 'Cut the rim in more, shorter segments (less grain run-out), steam-bend it instead, deepen it, or add spokes to shorten the span.',
      }),
    );
  },
});
