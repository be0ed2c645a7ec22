import { pointLoadsMaxMoment } from '../../model/beam-formulas.ts';
import type { RailPull } from '../../model/floor-result.ts';
import { frameSectionInPlan } from '../../model/spec-sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { governing, strengthCheck, stressReport, type CaseCheck, type CaseInfo } from './member-finding.ts';
import { NOT_CHECKED_MESSAGE, STRESS_MESSAGES } from './member-messages.ts';

type Pulls = RailPull['pulls'];

export const frameRailMember = defineRule({
  id: 'member.frame-rail',
  title: 'Floor frame rails under the strap pull',
  checks: 'Bending, in the plane of the floor, of each frame rail the straps pull on, as a simply supported span under the pull of each strap end where it is anchored: the pretension alone, the crew standing and over a bump.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'design-basis-floor'],
  needs: ['floorStatic', 'floorBump', 'bumpFactors'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: [],
  messages: { ...STRESS_MESSAGES, ...NOT_CHECKED_MESSAGE },
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'frame');
    const stat = ctx.models.floorStatic;
    const bump = ctx.models.floorBump;
    const unsolved = [stat, bump].find((r) => !r.converged);
    if (unsolved) {
      ctx.report({
        subject: 'frame.rails',
        label: 'floor frame rails',
        message: 'notChecked',
        params: { part: 'floor frame rails', reason: `the strap-floor model did not converge ${unsolved === stat ? 'with the crew standing' : 'over a bump'}, so the strap pull on the rails is not known` },
        severity: 'warning',
        unit: 'MPa',
        fix: 'Resolve the floor findings first; the rails are checked once the floor model converges.',
        working: [
          step('load factor on the crew', '', unsolved.factor, '1'),
          step('floor model iterations', '', unsolved.iterations, ''),
          ...(Number.isFinite(unsolved.residual_N) ? [step('residual', '', unsolved.residual_N, 'N')] : ['residual: none (the model was not solved)']),
          step('tolerance', '', unsolved.tolerance_N, 'N'),
        ],
      });
      return;
    }
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    // The straps pull in the plane of the floor: the rail bends about its vertical axis.
    const S = frameSectionInPlan(spec);
    const pitch = spec.floor_straps.pitch_mm;
    const T0 = spec.floor_straps.pretension_N;
    const loaded = stat.rails.filter((r) => r.total_N > 0);
    const cases: { info: CaseInfo; pulls: (rail: RailPull) => Pulls }[] = [
      { info: { id: 'pretension', title: 'strap pretension alone', combination: 'characteristic', gammaM: bending.gammaM, duration: 'permanent', sourceIds: [], working: `each strap end pulls T_0 on its rail (T_0 = ${num(T0)} N, pitch ${num(pitch)} mm)` }, pulls: (r) => r.pulls.map((p) => ({ ...p, force_N: T0 })) },
      { info: { id: 'standing', title: 'crew standing (strap-floor model, factor 1)', combination: 'characteristic', gammaM: bending.gammaM, duration: 'short', sourceIds: [], working: `each strap end's pull from the floor model (${stat.iterations} iterations, residual ${num(stat.residual_N)} N)` }, pulls: (r) => r.pulls },
      { info: { id: 'rough-ground', title: `rough ground (strap-floor model, factor ${num(bump.factor)})`, combination: 'characteristic', gammaM: bending.gammaM, duration: 'instantaneous', sourceIds: ctx.models.bumpFactors.crew.sources, working: `the floor model with the crew's weight × ${num(bump.factor)} (${bump.factorSource})` }, pulls: (r) => bump.rails.find((b) => b.rail === r.rail)!.pulls },
    ];
    const checks: CaseCheck[] = [];
    for (const c of cases) {
      const fm = bending.design(c.info.duration, c.info.gammaM);
      for (const rail of loaded) {
        const pulls = c.pulls(rail);
        const total = pulls.reduce((sum, p) => sum + p.force_N, 0);
        const peak = pulls.reduce((m, p) => Math.max(m, p.force_N), 0);
        const { M, at } = pointLoadsMaxMoment(rail.span_mm, pulls.map((p) => ({ at: p.at_mm, P: p.force_N })));
        checks.push(
          strengthCheck(c.info, `${rail.rail} rail`, M / S.W, bending, fm, [
            step(`ΣP over ${pulls.length} strap ends (largest ${num(peak)} N)`, '', total, 'N'),
            step(`M_max = max over x of [R_A·x − Σ P_i·(x − a_i)], at x = ${num(at, 'mm')} mm`, '', M, 'N·mm'),
            step('for comparison, a uniform load w = ΣP/L: w·L²/8 = ΣP·L/8', `${num(total)} × ${num(rail.span_mm)}/8`, (total * rail.span_mm) / 8, 'N·mm'),
            step('σ = M_max/W', `${num(M)} / ${num(S.W)}`, M / S.W, 'MPa'),
          ]),
        );
      }
    }
    if (checks.length === 0) return;
    const rail = governing(checks).mode;
    ctx.report(
      stressReport({
        subject: `frame.${rail.replace(' ', '-')}`,
        label: `${rail} of the floor frame`,
        part: part.label,
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          'rails pulled by the straps, each a simply supported span between the corners, loaded by the pull of each strap end where it is anchored:',
          ...loaded.map((r) => step(`span of the ${r.rail} rail`, '', r.span_mm, 'mm')),
          `section bent in plan: ${S.label}${S.label.includes('rectangle') ? ' (thickness × width)' : ''}`,
          step(`W = ${S.formulas.W[0]}`, S.formulas.W[1], S.W, 'mm³'),
          ...bending.working,
        ],
        sources: bending.sourceIds,
        fix: 'Widen the rails in plan (strength rises with the square of the width), lower the strap pretension, or add a cross-bar to halve the span of the long rails.',
      }),
    );
  },
});
