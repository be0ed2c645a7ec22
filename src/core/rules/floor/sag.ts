import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import type { Finding } from '../../findings/finding.ts';
import type { FloorModel } from '../../model/cable-net/floor-model.ts';
import { caseName, floorWorking, notSolvedFinding } from './floor-working.ts';

export const floorSag: Rule = {
  id: 'floor.sag',
  title: 'Floor sag under the crew and over the parts beneath',
  checks: 'How far the woven floor sags under each crew member standing, and whether it sags onto the pole or the axle beneath it, standing or at a bump.',
  kind: 'check',
  limits: ['advisory_sag_mm'],
  run(ctx) {
    const { spec, data } = ctx;
    const adv = ctx.limit('advisory_sag_mm');
    const stat = ctx.analysis.floorStatic;
    const bump = ctx.analysis.floorBump;
    const unsolved = [stat, bump].filter((m) => !m.converged);
    if (unsolved.length) {
      return unsolved.map((m) => notSolvedFinding(this.id, m, { severity: 'fail', unit: 'mm', what: 'sag', source: adv.source, working: floorWorking(spec, data, m).join('\n') }));
    }
    const base = floorWorking(spec, data, stat);
    const crew: Finding[] = stat.crew.map((c) => {
      const over = c.sag_mm > adv.value;
      return makeFinding(this.id, {
        severity: over ? 'warning' : 'pass',
        subject: `${c.role}, standing`,
        value: c.sag_mm,
        unit: 'mm',
        limit: adv.value,
        message: over ? 'floorSagOver' : 'floorSagWithin',
        params: { role: c.role, value: c.sag_mm.toFixed(1), limit: adv.value },
        fix: over ? 'Raise the pretension, use thicker or wider straps, a closer pitch or a two-way weave; stand on a sample panel to judge the footing.' : 'None needed.',
        source: adv.source,
        working: [...base, `sag at the centre of ${c.role}'s foot patch (interpolated between nodes) = ${c.sag_mm.toFixed(2)} mm; advisory ${adv.value} mm`].join('\n'),
      });
    });
    // The pole and axle: resting on one standing fails; striking one at a bump warns.
    const parts: Finding[] = stat.clearances.map((sp, i) => {
      const bp = bump.clearances[i];
      const touch = (m: FloorModel, sag: number) => `${caseName(m)}: sag over the ${sp.part} ${sag.toFixed(1)} mm`;
      const severity = sp.sag_mm > sp.clearance_mm ? 'fail' : bp.sag_mm > bp.clearance_mm ? 'warning' : 'pass';
      const shown = severity === 'fail' ? { m: stat, p: sp } : { m: bump, p: bp };
      const hits = severity !== 'pass';
      return makeFinding(this.id, {
        severity,
        subject: `floor over the ${sp.part}`,
        value: shown.p.sag_mm,
        unit: 'mm',
        limit: sp.clearance_mm,
        message: hits ? 'floorStrikes' : 'floorClears',
        params: { part: sp.part, value: shown.p.sag_mm.toFixed(1), limit: sp.clearance_mm.toFixed(0), case: caseName(shown.m) },
        fix: hits
          ? `Stiffen the floor (more pretension, thicker or wider straps, a closer pitch, a two-way weave), move the crew off the ${sp.part}, or deepen the frame rails so the ${sp.part} sits lower.`
          : 'None needed.',
        source: `geometry of the specification: the straps lie on the frame's top face and the ${sp.part}'s top is ${sp.clearance_mm.toFixed(0)} mm below it (layout)`,
        working: [
          ...floorWorking(spec, data, shown.m),
          `clearance = floor top − ${sp.part} top = ${sp.clearance_mm.toFixed(1)} mm, over x ${sp.x[0].toFixed(0)} to ${sp.x[1].toFixed(0)} mm, y ${sp.y[0].toFixed(0)} to ${sp.y[1].toFixed(0)} mm`,
          `${touch(stat, sp.sag_mm)} (at x ${sp.at.x.toFixed(0)}, y ${sp.at.y.toFixed(0)} mm); ${touch(bump, bp.sag_mm)} (at x ${bp.at.x.toFixed(0)}, y ${bp.at.y.toFixed(0)} mm)`,
          'resting on it standing fails; reaching it only at a bump warns',
        ].join('\n'),
      });
    });
    return [...crew, ...parts];
  },
};
