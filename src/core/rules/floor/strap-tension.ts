import { gradeUpper, makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { caseName, floorWorking, known, notSolvedFinding } from './floor-working.ts';

export const strapTension: Rule = {
  id: 'floor.strap-tension',
  title: 'Strap tension in the floor',
  checks: 'The largest strap stress in the woven floor, standing and at a bump, against the strap design strength: tensile strength times the efficiency of the strap ends at the frame, over the safety factor.',
  kind: 'check',
  limits: ['safety_factor', 'slot_efficiency', 'advisory_utilisation'],
  run(ctx) {
    const { spec, data } = ctx;
    const s = spec.floor_straps;
    const leather = data.leathers[s.material];
    const ft = leather.tensile_strength_MPa;
    const sf = ctx.limit('safety_factor');
    const eta = ctx.limit('slot_efficiency');
    const adv = ctx.limit('advisory_utilisation');
    const fd = (ft.value * eta.value) / sf.value;
    const advLimit = adv.value * fd;
    const source = `tensile strength: ${ft.source}; slot efficiency: ${eta.source}; safety factor: ${sf.source}`;
    const wet = leather.wet_strength_factor.value;
    return [ctx.analysis.floorStatic, ctx.analysis.floorBump].map((m) => {
      const working = [
        ...floorWorking(spec, data, m),
        `T_max = ${m.maxTension_N.toFixed(1)} N at ${m.maxTensionAt}`,
        `σ = T_max / (b × t) = ${m.maxTension_N.toFixed(1)} / (${s.width_mm} × ${s.thickness_mm}) = ${m.maxStress_MPa.toFixed(3)} MPa`,
        `f_d = f_t × η_slot / SF = ${ft.value} × ${eta.value} / ${sf.value} = ${fd.toFixed(3)} MPa; advisory ${adv.value} × f_d = ${advLimit.toFixed(3)} MPa`,
        `utilisation = ${m.maxStress_MPa.toFixed(3)} / ${fd.toFixed(3)} = ${(m.maxStress_MPa / fd).toFixed(3)}`,
      ].join('\n');
      const subject = caseName(m);
      if (!m.converged) {
        return notSolvedFinding(this.id, m, { severity: 'fail', unit: 'MPa', value: known(m.maxStress_MPa), limit: fd, what: 'straps', source, working });
      }
      const severity = gradeUpper(m.maxStress_MPa, advLimit, fd);
      const over = severity === 'warning' ? { level: 'advisory', at: advLimit, pct: adv.value } : { level: 'hard', at: fd, pct: 1 };
      return makeFinding(this.id, {
        severity,
        subject,
        value: m.maxStress_MPa,
        unit: 'MPa',
        limit: severity === 'pass' ? fd : over.at,
        message: severity === 'pass' ? 'floorTensionWithin' : 'floorTensionOver',
        params: { case: subject, tension: m.maxTension_N.toFixed(0), value: m.maxStress_MPa.toFixed(2), where: m.maxTensionAt, pct: ((100 * m.maxStress_MPa) / fd).toFixed(0), strength: fd.toFixed(2), level: over.level, limitPct: (100 * over.pct).toFixed(0) },
        fix: severity === 'pass'
          ? `None needed. Keep the straps dry: wet ${s.material} keeps about ${Math.round(100 * wet)} % of its strength (rules data).`
          : `Use wider or thicker straps, a closer pitch or a two-way weave so more straps share each person's weight, or lower the pretension; test strips of your own hide for a measured strength. Keep the straps dry: wet ${s.material} keeps about ${Math.round(100 * wet)} % of its strength.`,
        source,
        working,
      });
    });
  },
};
