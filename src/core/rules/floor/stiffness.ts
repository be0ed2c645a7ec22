import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { floorWorking, netSources, notSolvedMessage, notSolvedReport, standingCase } from './floor-working.ts';

export const floorStiffness = defineRule({
  id: 'floor.stiffness',
  title: 'Floor stiffness under each crew member',
  checks: 'The vertical stiffness of the woven floor under each crew member standing, as load over sag (secant) and as the slope at that load (tangent), the spring the ride model puts under each person.',
  kind: 'note',
  method: ['design-basis-floor'],
  needs: ['floorStatic'],
  limits: {},
  params: [],
  messages: {
    note: { code: 2231, text: 'Under {role} ({load:N} standing) the floor sags {sag:mm}: secant stiffness {value:N/mm}, tangent stiffness {tangent:N/mm}.' },
    notSolved: notSolvedMessage(2232),
  },
  run(ctx) {
    const c = standingCase(ctx.models.floorStatic);
    const m = c.model;
    const sources = netSources(ctx.spec, ctx.data);
    const base = floorWorking(ctx.spec, ctx.data, m);
    if (!m.converged) {
      ctx.report(notSolvedReport(c, { subject: 'floor.net', severity: 'info', unit: 'N/mm', what: 'stiffness', sources, working: base }));
      return;
    }
    m.crew.forEach((p, i) =>
      ctx.report({
        subject: `crew.${i}`,
        label: `${p.role}, standing`,
        message: 'note',
        params: { role: p.role, load: p.load_N, sag: p.sag_mm, tangent: p.tangentStiffness_N_per_mm },
        value: p.secantStiffness_N_per_mm,
        unit: 'N/mm',
        severity: 'info',
        load_case: c.load_case,
        fix: 'None needed; a stiffer floor (more pretension, thicker straps, closer pitch) passes more of each bump to the crew, a softer one sags more.',
        sources,
        working: [
          ...base,
          step('k_s = P / sag', `${num(p.load_N)} / ${num(p.sag_mm)}`, p.secantStiffness_N_per_mm, 'N/mm'),
          `K_t: the net's tangent stiffness matrix at the standing load; w spreads one newton over ${p.role}'s foot patch; i reads ${p.sagRead === 'patch' ? "the mean sag under the patch (its centre is over the frame, which does not sag)" : 'the sag at its centre'}`,
          step('k_t = 1 / (iᵀ K_t⁻¹ w)', '', p.tangentStiffness_N_per_mm, 'N/mm'),
          'the other crew stand where they are; a stiffening net has its tangent above its secant',
        ],
      }),
    );
  },
});
