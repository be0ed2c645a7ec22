import type { LoadPosition } from '../../model/wheel/wheel-ring-scan.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { navePart, timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { strengthCheck, stressReport, type CaseCheck } from '../member/member-finding.ts';
import { NOT_CHECKED_MESSAGE, STRESS_MESSAGES } from '../member/member-messages.ts';
import { ringIntro, ringUnsettled, ringUnsettledReport } from './ring-working.ts';

/** The largest spoke force over the contact positions, with where it arose. */
function largestSpokeForce(scan: readonly LoadPosition[]): { F: number; p: LoadPosition } {
  let best: { F: number; p: LoadPosition } | null = null;
  for (const p of scan) {
    const F = Math.max(...p.result.spokes.map((s) => s.force));
    if (best === null || F > best.F) best = { F, p };
  }
  if (best === null) throw new Error('no contact position to read the spokes from');
  return best;
}

export const spokeTenon = defineRule({
  id: 'wheel.spoke-tenon',
  title: "Spoke tenons in the nave and the felloe",
  checks: "The spoke's push, the largest any spoke takes in the ring frame of the wheel with the contact anywhere on the rim, in every load case: the tenon crushing along its own grain, and the spoke's shoulders bearing across the grain of the nave and of the felloe.",
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'en-1995-1-1-6-1-5'],
  needs: ['mass', 'memberCases', 'wheelRingScan'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: ['tenon_thickness_fraction', 'bearing_extension_mm'],
  messages: { ...STRESS_MESSAGES, ...NOT_CHECKED_MESSAGE },
  run(ctx) {
    const { spec, data } = ctx;
    const lay = ctx.models.mass.layout;
    const w = spec.wheels;
    const M = spec.moisture_content_pct;
    const cases = ctx.models.memberCases;
    const { ws, scans } = ctx.models.wheelRingScan;
    const unsettled = ringUnsettled(scans);
    if (unsettled) return ctx.report(ringUnsettledReport('wheel.spoke.tenon', 'spoke tenon and shoulders', 'spoke tenon', unsettled, ringIntro(spec, lay, ws)));
    const frac = ctx.param('tenon_thickness_fraction');
    const ext = ctx.param('bearing_extension_mm');
    const { width_mm: b, thickness_mm: t } = w.spoke;
    const At = b * frac.value * t;
    const As = b * t;
    // Which face of the spoke lies along the host's grain is not stated: the shorter, the safe side.
    const along = Math.min(b, t);
    const across = Math.max(b, t);
    const Ab = (along + ext.value) * across - At;
    const spoke = timberPart(spec, 'spoke');
    const nave = navePart(spec);
    const crush = timberStrength(data, spoke, 'compression', M);
    const naveAcross = timberStrength(data, nave, 'compression', M, 90);
    const felloeAcross = timberStrength(data, timberPart(spec, 'felloe'), 'compression', M, 90);
    const checks: CaseCheck[] = cases.flatMap((c, i) => {
      const { F, p } = largestSpokeForce(scans[i]);
      const pushed = `largest spoke push ${num(F)} N (${p.label})`;
      const bearing = (host: string) => step(`σ_c,90 = F/A_ef on the ${host}`, `${num(F)} / ${num(Ab)}`, F / Ab, 'MPa');
      return [
        strengthCheck(c, 'tenon crushing along its grain', F / At, crush, crush.design(c.duration, c.gammaM), [pushed, step('σ_c,0 = F/A_tenon', `${num(F)} / ${num(At)}`, F / At, 'MPa')]),
        strengthCheck(c, 'shoulders bearing across the nave grain', F / Ab, naveAcross, naveAcross.design(c.duration, c.gammaM), [pushed, bearing('nave')]),
        strengthCheck(c, 'shoulders bearing across the felloe grain', F / Ab, felloeAcross, felloeAcross.design(c.duration, c.gammaM), [pushed, bearing('felloe')]),
      ];
    });
    ctx.report(
      stressReport({
        subject: 'wheel.spoke.tenon',
        label: 'spoke tenon and shoulders',
        part: 'spoke tenon',
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          ...ringIntro(spec, lay, ws),
          step('A_tenon = b·(tenon_thickness_fraction·t)', `${num(b)} × ${num(frac.value)} × ${num(t)}`, At, 'mm²'),
          step('A_spoke = b·t', `${num(b)} × ${num(t)}`, As, 'mm²'),
          step('A_ef = (min(b, t) + bearing_extension_mm)·max(b, t) − A_tenon', `(${num(along)} + ${num(ext.value)}) × ${num(across)} − ${num(At)}`, Ab, 'mm²'),
          'the shoulders bear on the nave and on the felloe across their grain; the bearing spreads along that grain beyond the shoulder (EN 1995-1-1 section 6.1.5), taken on the spoke\'s shorter face',
          'the whole push is taken once by the tenon alone (a shoulder that has shrunk clear) and once by the shoulders alone (a tenon whose end stands clear of its mortise), the safe side of each',
          'in the tenon:',
          ...crush.working,
          'across the nave:',
          ...naveAcross.working,
          'across the felloe:',
          ...felloeAcross.working,
        ],
        sources: [...new Set([...crush.sourceIds, ...naveAcross.sourceIds, ...felloeAcross.sourceIds, ...ws.sourceIds, ...frac.sources, ...ext.sources])],
        fix: 'Use a thicker spoke or a larger tenon, a harder species for the nave (its grain is crushed across), or more spokes to share the load.',
      }),
    );
  },
});
