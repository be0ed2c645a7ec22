import type { Rule } from '../../engine/rule.ts';
import { centreLoadMoment } from '../../model/beam-formulas.ts';
import { rectangle } from '../../model/sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { kModBasis, memberFinding, type CaseCheck } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

/**
 * Grain run-out of a felloe sawn from straight stock: a segment of 360°/pieces
 * has straight grain along its chord, so at its ends the grain crosses the rim
 * at half the segment angle. A steam-bent felloe's grain follows the rim.
 */
export function felloeRunoutDeg(pieces: number, bent: boolean): number {
  return bent ? 0 : 180 / pieces;
}

export const felloeMember: Rule = {
  id: 'member.felloe',
  title: 'Felloe span strength',
  checks: 'Bending of the rim between two spokes, as a simply supported span with the wheel load at its middle, in every load case, against the design strength of the felloe timber with the grain run-out of sawn segments.',
  kind: 'check',
  limits: ['utilisation_max'],
  run(ctx) {
    const { spec, data } = ctx;
    const w = spec.wheels;
    const lay = ctx.analysis.mass.layout;
    const bent = w.felloe.bend_radius_mm !== undefined;
    const runout = felloeRunoutDeg(w.felloe.pieces, bent);
    const part = timberPart(spec, 'felloe');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct, runout);
    const Rm = (lay.felloeInner + lay.felloeOuter) / 2;
    const span = (2 * Math.PI * Rm) / w.spokes;
    const S = rectangle(w.felloe.width_mm, w.felloe.depth_mm);
    const checks: CaseCheck[] = ctx.analysis.memberCases.map((c) => {
      const fm = bending.design(c.duration);
      const Mc = centreLoadMoment(c.wheel_N, span);
      return { memberCase: c, mode: 'bending between spokes', demand: Mc / S.W, capacity: fm.value, basis: kModBasis(fm.kMod, c.duration), sources: [fm.kModSource], line: `M = N_w·span/4 = ${f(c.wheel_N, 1)} × ${f(span, 1)}/4 = ${f(Mc / 1000, 1)} N·m; σ = M/W = ${f(Mc / S.W)} MPa; ${fm.line}` };
    });
    const intro = [
      `span = 2π·R_m/n = 2π × ${f(Rm, 1)} / ${w.spokes} = ${f(span, 1)} mm (R_m on the felloe's mid-depth); ${S.label} (width × depth), W = b·h²/6 = ${f(S.W, 0)} mm³`,
      bent
        ? 'steam-bent felloe: the grain follows the rim'
        : `sawn segments, ${w.felloe.pieces} to the rim: grain run-out at the segment ends 180°/${w.felloe.pieces} = ${f(runout, 1)}°${part.grainSlopeDeg > 0 ? `, plus the stated slope of grain ${part.grainSlopeDeg}°` : ''}`,
      ...bending.working,
    ];
    const fix = bent
      ? 'Deepen the felloe, add spokes to shorten the span, or use a stronger species or selected stock.'
      : 'Cut the rim in more, shorter segments (less grain run-out), steam-bend it instead, deepen it, or add spokes to shorten the span.';
    return [memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks, umax: ctx.limit('utilisation_max'), intro, sources: bending.sources, fix })];
  },
};
