import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { floorWorking, notSolvedFinding } from './floor-working.ts';

export const floorStiffness: Rule = {
  id: 'floor.stiffness',
  title: 'Floor stiffness under each crew member',
  checks: 'The vertical stiffness of the woven floor under each crew member standing, as load over sag (secant) and as the slope at that load (tangent), the spring the ride model puts under each person.',
  kind: 'note',
  limits: [],
  run(ctx) {
    const m = ctx.analysis.floorStatic;
    const base = floorWorking(ctx.spec, ctx.data, m);
    if (!m.converged) {
      return [notSolvedFinding(this.id, m, { severity: 'advice', unit: 'N/mm', what: 'stiffness', source: 'mechanics note, section 5: the cable-net model', working: base.join('\n') })];
    }
    return m.crew.map((c) =>
      makeFinding(this.id, {
        severity: 'advice',
        subject: `${c.role}, standing`,
        value: c.secantStiffness_N_per_mm,
        unit: 'N/mm',
        limit: null,
        message: 'floorStiffnessNote',
        params: { role: c.role, load: c.load_N.toFixed(0), sag: c.sag_mm.toFixed(1), value: c.secantStiffness_N_per_mm.toFixed(1), tangent: c.tangentStiffness_N_per_mm.toFixed(1) },
        fix: 'None needed; a stiffer floor (more pretension, thicker straps, closer pitch) passes more of each bump to the crew, a softer one sags more.',
        source: 'mechanics note, section 5: the cable-net model; the tangent from the tangent stiffness matrix at the standing load',
        working: [
          ...base,
          `secant k = P / sag = ${c.load_N.toFixed(1)} / ${c.sag_mm.toFixed(3)} = ${c.secantStiffness_N_per_mm.toFixed(2)} N/mm`,
          `tangent k = 1 / (i^T K_t^-1 w): w spreads 1 N over ${c.role}'s foot patch, i reads the sag at its centre = ${c.tangentStiffness_N_per_mm.toFixed(2)} N/mm`,
          '(the other crew stand where they are; a stiffening net has tangent above secant)',
        ].join('\n'),
      }),
    );
  },
};
