import { formatPercent } from '../../format/number-format.ts';
import { leatherDesignStrength } from '../../model/leather-strength.ts';
import { defineRule, type LimitSpec } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { num, step } from '../../pipeline/step.ts';
import { strengthCases, floorWorking, known, netSources, notSolvedMessage, notSolvedReport } from './floor-working.ts';

const UTILISATION: LimitSpec = { direction: 'max', unit: "of the strap's design strength" };

export const strapTension = defineRule({
  id: 'floor.strap-tension',
  title: 'Strap tension in the floor',
  checks: "The largest strap stress in the woven floor, solved with its frame in the fundamental combination (standing, and over rough ground) and on the stone (accidental), against the strap's design strength: the one leather chain f_k × η_joint × k_wet / γ_M, the laced ends at the frame counted by η_joint.",
  kind: 'check',
  method: ['design-basis-floor', 'design-basis-materials', 'design-basis-combinations'],
  needs: ['floorDesign', 'floorDesignRough', 'floorStone', 'bumpFactors', 'stoneFactors'],
  limits: { utilisation: UTILISATION },
  params: [],
  messages: {
    over: { code: 2201, text: 'The largest strap tension in the {case} case is {tension:N}, a stress of {value:MPa} at {where}: {share:%} of the design strength {strength:MPa}; the advisory limit is {advisory:MPa} and the hard limit {hard:MPa}.' },
    within: { code: 2202, text: 'The largest strap tension in the {case} case is {tension:N}, a stress of {value:MPa} at {where}: {share:%} of the design strength {strength:MPa}.' },
    notSolved: notSolvedMessage(2203),
  },
  run(ctx) {
    const { spec, data } = ctx;
    const s = spec.floor_straps;
    const leather = data.leathers[s.material];
    const lim = ctx.limit('utilisation');
    const dry = `Keep the straps dry: wet ${s.material} keeps about ${formatPercent(leather.wet_strength_factor.value)} of its strength (rules data).`;
    for (const c of strengthCases(ctx.models)) {
      const m = c.model;
      const strength = leatherDesignStrength(data, s.material, { joint: true, wet: spec.operation.wet, combination: c.combination });
      const fd = strength.value;
      const sources = [...strength.sources, ...netSources(spec, data)];
      const working = [
        ...floorWorking(spec, data, m),
        step(`T_max (${m.maxTensionAt})`, '', known(m.maxTension_N), 'N'),
        step('σ = T_max / (b × t)', `${num(m.maxTension_N)} / (${num(s.width_mm, 'mm')} × ${num(s.thickness_mm, 'mm')})`, known(m.maxStress_MPa), 'MPa'),
        ...strength.steps,
        ...(lim.advisory !== null ? [step('advisory limit = level × f_d', `${num(lim.advisory)} × ${num(fd)}`, lim.advisory * fd, 'MPa')] : []),
        ...(lim.hard !== null ? [step('hard limit = level × f_d', `${num(lim.hard)} × ${num(fd)}`, lim.hard * fd, 'MPa')] : []),
        step('utilisation = σ / f_d', `${num(m.maxStress_MPa)} / ${num(fd)}`, known(m.maxStress_MPa / fd), '1'),
      ];
      if (!m.converged) {
        ctx.report(notSolvedReport(c, { subject: 'floor.strap', severity: 'fail', unit: 'MPa', value: known(m.maxStress_MPa), what: 'straps', sources, working }));
        continue;
      }
      ctx.report({
        subject: 'floor.strap',
        label: `the most loaded strap, ${c.label}`,
        message: { pass: 'within', warning: 'over', fail: 'over' },
        params: { case: c.name, tension: m.maxTension_N, where: m.maxTensionAt, share: m.maxStress_MPa / fd, strength: fd },
        value: m.maxStress_MPa,
        unit: 'MPa',
        against: { limit: 'utilisation', times: fd },
        load_case: c.load_case,
        combination: c.combination,
        fix:
          grade(m.maxStress_MPa, lim, UTILISATION, fd).severity === 'pass'
            ? `None needed. ${dry}`
            : `Use wider or thicker straps, a closer pitch or a two-way weave so more straps share each person's weight, or lower the pretension; test strips of your own hide for a measured strength. ${dry}`,
        sources: [...sources, ...c.sources],
        working,
      });
    }
  },
});
