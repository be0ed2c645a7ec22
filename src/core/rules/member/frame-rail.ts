import type { FloorModel } from '../../model/cable-net/floor-model.ts';
import type { RailMoment } from '../../model/floor-frame/frame-model.ts';
import type { FloorFrameResult } from '../../model/floor-frame/frame-result.ts';
import { frameSectionInPlan } from '../../model/spec-sections.ts';
import type { Section } from '../../model/sections.ts';
import { combinationFactors } from '../../model/combination-factors.ts';
import { strengthCases } from '../floor/floor-working.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { governing, strengthCheck, stressReport, type CaseCheck, type CaseInfo, type Working } from './member-finding.ts';
import { NOT_CHECKED_MESSAGE, STRESS_MESSAGES } from './member-messages.ts';
import { strengthStep } from './strength-step.ts';

// The floor frame's rails bending in plan, read from the floor model solved
// with its frame: a closed loop whose anchors move in as the rails bow, so
// the straps slacken and the pull on the rails is less than on rigid anchors.
// Each rail's largest moment is checked with the axial force beside it
// (EN 1995-1-1, 6.2.4 where it is compressed).

export const frameRailMember = defineRule({
  id: 'member.frame-rail',
  title: 'Floor frame rails under the strap pull',
  checks:
    'Bending, in the plane of the floor, of the frame rails as one closed loop (continuous bent corners, rigid square ones, and any lashed pole or axle beneath as a strut), under the pulls of the straps solved together with the frame: the pretension alone, and the floor in the fundamental combination (standing, rough ground) and on the stone (accidental).',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'design-basis-floor', 'design-basis-combinations'],
  needs: ['floorStatic', 'floorDesign', 'floorDesignRough', 'floorStone', 'bumpFactors', 'stoneFactors'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: [],
  messages: { ...STRESS_MESSAGES, ...NOT_CHECKED_MESSAGE },
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'frame');
    const stat = ctx.models.floorStatic;
    const floors = strengthCases(ctx.models);
    const unsolvedCase = [{ model: stat, name: 'crew standing' }, ...floors].find((c) => !c.model.converged || c.model.frame === null);
    if (unsolvedCase) {
      const unsolved = unsolvedCase.model;
      ctx.report({
        subject: 'frame.rails',
        label: 'floor frame rails',
        message: 'notChecked',
        params: { part: 'floor frame rails', reason: `the strap-floor model did not converge in the ${unsolvedCase.name} case, so the strap pull on the rails is not known` },
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
    const statFrame = stat.frame!;
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    const compression = timberStrength(data, part, 'compression', spec.moisture_content_pct);
    // The straps pull in the plane of the floor: the rail bends about its vertical axis.
    const S = frameSectionInPlan(spec);
    const f = combinationFactors(data);
    // The pretension is an imposed strain, taken at its estimate (× 1.0), a permanent action; the crew's
    // weight and its dynamic increments as the floor's design states give them.
    const cases: { info: CaseInfo; rails: RailMoment[] }[] = [
      {
        info: { id: 'pretension', title: 'strap pretension alone', combination: 'fundamental', gammaM: bending.gammaM, duration: 'permanent', sourceIds: [], working: pretensionWorking(stat, statFrame) },
        rails: statFrame.pretension.rails,
      },
      ...floors.map((c) => {
        const acc = c.combination === 'accidental';
        return {
          info: {
            id: c.load_case,
            title: `${c.label} (floor and frame model)`,
            combination: c.combination,
            gammaM: acc ? f.gammaMaccidental : bending.gammaM,
            duration: acc ? ('instantaneous' as const) : ('short' as const),
            sourceIds: c.sources,
            working: caseWorking(c.model),
          },
          rails: c.model.frame!.rails,
        };
      }),
    ];
    const checks: CaseCheck[] = [];
    for (const c of cases) {
      const fm = bending.design(c.info.duration, c.info.gammaM);
      const fc = compression.design(c.info.duration, c.info.gammaM);
      for (const r of c.rails) {
        const sm = r.M_Nmm / S.W;
        const sc = Math.max(0, -r.N_N) / S.area;
        // EN 1995-1-1 (6.19): (σ_c/f_c)² + σ_m/f_m ≤ 1, written as a bending stress against f_m.
        const demand = sm + fm.value * (sc / fc.value) ** 2;
        const steps: Working[] = [
          step(`largest moment in plan on the ${r.rail} rail, at x ${num(r.at.x, 'mm')}, y ${num(r.at.y, 'mm')} mm`, '', r.M_Nmm, 'N·mm'),
          step(`axial force there (${r.N_N < 0 ? 'compression' : 'tension'})`, '', r.N_N, 'N'),
          step('σ_m = M/W', `${num(r.M_Nmm)} / ${num(S.W)}`, sm, 'MPa'),
          ...(r.N_N < 0
            ? [step('σ_c = N/A', `${num(-r.N_N)} / ${num(S.area)}`, sc, 'MPa'), strengthStep(compression, fc), step('σ_m + f_m,d·(σ_c/f_c,d)² (EN 1995-1-1, 6.2.4)', `${num(sm)} + ${num(fm.value)} × (${num(sc)}/${num(fc.value)})²`, demand, 'MPa')]
            : [`axial tension ${num(r.N_N)} N (σ_t = ${num(r.N_N / S.area)} MPa) is not added: the species data hold no tension strength along the grain`]),
        ];
        checks.push(strengthCheck(c.info, `${r.rail} rail`, demand, bending, fm, steps));
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
        intro: [...loopWorking(statFrame, S), `section bent in plan: ${S.label}${S.label.includes('rectangle') ? ' (thickness × width)' : ''}`, step(`W = ${S.formulas.W[0]}`, S.formulas.W[1], S.W, 'mm³'), ...bending.working],
        sources: [...bending.sourceIds, ...compression.sourceIds, ...statFrame.sources, 'en-1995-1-1-6-2-4'],
        fix: 'Widen the rails in plan (strength rises with the square of the width), lower the strap pretension, bend the front corners round rather than jointing them square, or lash the pole or the axle beneath to the rails to hold them apart.',
      }),
    );
  },
});

function loopWorking(f: FloorFrameResult, S: Section): Working[] {
  return [
    `the frame as one closed loop in plan: the rear rail, the side rails and the front rail, ${f.cornerRadius_mm > 0 ? `bent round the front corners at a centre-line radius of ${num(f.cornerRadius_mm, 'mm')} mm (continuous), with rigid square rear corners` : 'with four rigid square corners'}; ${num(f.elements, 'count')} beam elements on the rails' centre line, a node at every strap end`,
    `each strap end pulls its rail inwards at its anchor with the strap's pull; the anchors move with the rails and the straps slacken as they bow (the net and the frame solved together)`,
    step(`E (${f.species}, mean along the grain at the build's moisture)`, '', f.E_MPa, 'MPa'),
    step(`I (${S.label}, bent in plan)`, '', f.I_mm4, 'mm⁴'),
    ...f.struts.flatMap((s) => [`${s.part} beneath, lashed to the rails: a spring strut between them`, ...s.working]),
    ...f.unsupported,
  ];
}

function pretensionWorking(m: FloorModel, f: FloorFrameResult): string {
  return `each strap cut to carry T_0 = ${num(m.pretension_N)} N on rigid anchors, no one aboard; with the rails bowing the straps carry ${num(f.pretension.minPull_N)} to ${num(f.pretension.maxPull_N)} N (anchors move in up to ${num(f.pretension.maxAnchorMove_mm, 'mm')} mm)`;
}

function caseWorking(m: FloorModel): string {
  const f = m.frame!;
  return `the crew's weight × ${num(m.factor)} (${m.factorSource}); floor and frame solved in ${num(m.iterations, 'count')} Newton steps (residual ${num(m.residual_N)} N); anchors move in up to ${num(f.maxAnchorMove_mm, 'mm')} mm${f.struts.length ? `; ${f.struts.map((s) => `${s.part} strut ${num(s.force_N)} N`).join(', ')}` : ''}`;
}
