import { formatPercent } from '../../format/number-format.ts';
import { defineRule, type LimitSpec } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { num, step } from '../../pipeline/step.ts';
import { floorCases, floorWorking, known, netSources, notSolvedMessage, notSolvedReport } from './floor-working.ts';

const UTILISATION: LimitSpec = { direction: 'max', unit: "of the strap's design strength" };

export const strapTension = defineRule({
  id: 'floor.strap-tension',
  title: 'Strap tension in the floor',
  checks: 'The largest strap stress in the woven floor, standing and at a bump, against the strap design strength: tensile strength times the efficiency of the strap ends at the frame, over the safety factor.',
  kind: 'check',
  method: ['design-basis-floor', 'design-basis-materials'],
  needs: ['floorStatic', 'floorBump', 'bumpFactors'],
  limits: { utilisation: UTILISATION },
  params: ['safety_factor', 'slot_efficiency'],
  messages: {
    over: { code: 2201, text: 'The largest strap tension in the {case} case is {tension:N}, a stress of {value:MPa} at {where}: {share:%} of the design strength {strength:MPa}; the advisory limit is {advisory:MPa} and the hard limit {hard:MPa}.' },
    within: { code: 2202, text: 'The largest strap tension in the {case} case is {tension:N}, a stress of {value:MPa} at {where}: {share:%} of the design strength {strength:MPa}.' },
    notSolved: notSolvedMessage(2203),
  },
  run(ctx) {
    const { spec, data } = ctx;
    const s = spec.floor_straps;
    const leather = data.leathers[s.material];
    const ft = leather.tensile_strength_MPa;
    const sf = ctx.param('safety_factor');
    const eta = ctx.param('slot_efficiency');
    const lim = ctx.limit('utilisation');
    const fd = (ft.value * eta.value) / sf.value;
    const sources = [...ft.sources, ...eta.sources, ...sf.sources, ...netSources(spec, data)];
    const dry = `Keep the straps dry: wet ${s.material} keeps about ${formatPercent(leather.wet_strength_factor.value)} of its strength (rules data).`;
    for (const c of floorCases(ctx.models)) {
      const m = c.model;
      const working = [
        ...floorWorking(spec, data, m),
        step(`T_max (${m.maxTensionAt})`, '', known(m.maxTension_N), 'N'),
        step('σ = T_max / (b × t)', `${num(m.maxTension_N)} / (${num(s.width_mm, 'mm')} × ${num(s.thickness_mm, 'mm')})`, known(m.maxStress_MPa), 'MPa'),
        step('f_d = f_t × η_slot / SF', `${num(ft.value)} × ${num(eta.value)} / ${num(sf.value)}`, fd, 'MPa'),
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
