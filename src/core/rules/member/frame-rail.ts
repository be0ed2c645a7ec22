import type { Rule } from '../../engine/rule.ts';
import { pointLoadsMaxMoment } from '../../model/beam-formulas.ts';
import type { FloorResult } from '../../model/floor-result.ts';
import { rectangle } from '../../model/sections.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import { kModBasis, memberFinding, type CaseCheck, type CaseInfo } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

export const frameRailMember: Rule = {
  id: 'member.frame-rail',
  title: 'Floor frame rails under the strap pull',
  checks: 'Bending, in the plane of the floor, of each frame rail the straps pull on, as a simply supported span under the pull of each strap end where it is anchored: the pretension alone, the crew standing and over a bump.',
  kind: 'check',
  limits: ['utilisation_max'],
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'frame');
    const frame = spec.box.floor.frame;
    const stat = ctx.analysis.floorStatic;
    const bump = ctx.analysis.floorBump;
    const unsolved = [stat, bump].find((r) => !r.converged);
    if (unsolved) {
      return [makeFinding(this.id, { severity: 'warning', subject: 'floor frame rails', value: null, unit: 'MPa', limit: null, message: 'memberNotChecked', params: { part: 'floor frame rails', reason: `the strap-floor model did not converge at factor ${unsolved.factor} (residual ${f(unsolved.residual_N)} N against ${f(unsolved.tolerance_N)} N), so the strap pull on the rails is not known` }, fix: 'Resolve the floor findings first; the rails are checked once the floor model converges.', source: ctx.limit('utilisation_max').source, working: `floor model: ${unsolved.iterations} iterations, residual ${f(unsolved.residual_N)} N, tolerance ${f(unsolved.tolerance_N)} N` })];
    }
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    // The straps pull in the plane of the floor: the rail bends about its vertical axis.
    const S = rectangle(frame.thickness_mm, frame.width_mm);
    const pitch = spec.floor_straps.pitch_mm;
    const T0 = spec.floor_straps.pretension_N;
    const loaded = stat.rails.filter((r) => r.total_N > 0);
    type Pulls = FloorResult['rails'][number]['pulls'];
    const cases: { info: CaseInfo; pulls: (rail: FloorResult['rails'][number]) => Pulls }[] = [
      { info: { id: 'pretension', title: 'strap pretension alone', duration: 'permanent', sources: [], working: `each strap end pulls T_0 = ${T0} N on its rail (pitch ${pitch} mm)` }, pulls: (r) => r.pulls.map((p) => ({ ...p, force_N: T0 })) },
      { info: { id: 'standing', title: 'crew standing (strap-floor model, factor 1)', duration: 'short', sources: [], working: `each strap end's pull from the floor model (${stat.iterations} iterations, residual ${f(stat.residual_N)} N)` }, pulls: (r) => r.pulls },
      { info: { id: 'bump', title: `bump (strap-floor model, factor ${bump.factor})`, duration: 'instantaneous', sources: [bump.factorSource], working: `the floor model with the crew's weight × ${bump.factor}` }, pulls: (r) => bump.rails.find((b) => b.rail === r.rail)!.pulls },
    ];
    const checks: CaseCheck[] = [];
    for (const c of cases) {
      const fm = bending.design(c.info.duration);
      for (const rail of loaded) {
        const pulls = c.pulls(rail);
        const total = pulls.reduce((sum, p) => sum + p.force_N, 0);
        const peak = pulls.reduce((m, p) => Math.max(m, p.force_N), 0);
        const { M, at } = pointLoadsMaxMoment(rail.span_mm, pulls.map((p) => ({ at: p.at_mm, P: p.force_N })));
        checks.push({ memberCase: c.info, mode: `${rail.rail} rail`, demand: M / S.W, capacity: fm.value, basis: kModBasis(fm.kMod, c.info.duration), sources: [fm.kModSource], line: `${pulls.length} strap ends, ΣP = ${f(total, 0)} N (largest ${f(peak, 1)} N); M_max = max over x of [R_A·x − Σ P_i·(x − a_i)] = ${f(M / 1000, 1)} N·m at ${f(at, 0)} mm (for comparison, a uniform load w = ΣP/L gives w·L²/8 = ${f((total * rail.span_mm) / 8 / 1000, 1)} N·m); σ = M/W = ${f(M / S.W)} MPa; ${fm.line}` });
      }
    }
    if (checks.length === 0) return [];
    const intro = [
      `rails pulled by the straps: ${loaded.map((r) => `${r.rail} (span ${f(r.span_mm, 0)} mm)`).join(', ')}; each a simply supported span between the corners, loaded by the pull of each strap end where it is anchored`,
      `section bent in plan: ${S.label} (thickness × width), W = t·w²/6 = ${f(S.W, 0)} mm³`,
      ...bending.working,
    ];
    return [memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks, umax: ctx.limit('utilisation_max'), intro, sources: bending.sources, fix: 'Widen the rails in plan (strength rises with the square of the width), lower the strap pretension, or add a cross-bar to halve the span of the long rails.' })];
  },
};
