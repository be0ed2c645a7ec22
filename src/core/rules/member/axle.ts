import type { Rule } from '../../engine/rule.ts';
import { armMoment, axleArm } from '../../model/members/axle-arm.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { kModBasis, memberFinding, type CaseCheck } from './member-finding.ts';

const f = (v: number, d = 2) => v.toFixed(d);

export const axleMember: Rule = {
  id: 'member.axle',
  title: 'Axle arm strength',
  checks: 'Bending of the axle arm at the box bearing and at the nave, and shear at the bearing, under the wheel load standing, over a bump, braking and on the outer wheel in the design turn, against the design strength of the axle timber.',
  kind: 'check',
  limits: ['utilisation_max'],
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'axle');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    const shear = timberStrength(data, part, 'shear', spec.moisture_content_pct);
    const g = axleArm(spec);
    const checks: CaseCheck[] = [];
    for (const c of ctx.analysis.memberCases) {
      const fm = bending.design(c.duration);
      const fv = shear.design(c.duration);
      const basis = kModBasis(fm.kMod, c.duration);
      const Mb = armMoment(c.wheel_N, c.wheelLateral_N, g.a, g.wheelRadius);
      const Ms = armMoment(c.wheel_N, c.wheelLateral_N, g.naveArm, g.wheelRadius);
      const lat = c.wheelLateral_N > 0 ? ` + ${f(c.wheelLateral_N, 1)} × ${g.wheelRadius}` : '';
      const tau = (g.bearing.shearFactor * c.wheel_N) / g.bearing.area;
      checks.push(
        { memberCase: c, mode: 'bending at the bearing', demand: Mb / g.bearing.W, capacity: fm.value, basis, sources: [fm.kModSource], line: `M = N_w·a + F_lat·r = ${f(c.wheel_N, 1)} × ${g.a}${lat} = ${f(Mb / 1000, 1)} N·m; σ = M/W = ${f(Mb, 0)} / ${f(g.bearing.W, 0)} = ${f(Mb / g.bearing.W)} MPa; ${fm.line}` },
        { memberCase: c, mode: 'bending at the nave', demand: Ms / g.spindle.W, capacity: fm.value, basis, sources: [fm.kModSource], line: `M = N_w·L_nave/2 + F_lat·r = ${f(c.wheel_N, 1)} × ${g.naveArm}${lat} = ${f(Ms / 1000, 1)} N·m; σ = M/W = ${f(Ms, 0)} / ${f(g.spindle.W, 0)} = ${f(Ms / g.spindle.W)} MPa; f_d = ${f(fm.value)} MPa` },
        { memberCase: c, mode: 'shear at the bearing', demand: tau, capacity: fv.value, basis, sources: [fv.kModSource], line: `τ = 1.5·V/A = 1.5 × ${f(c.wheel_N, 1)} / ${f(g.bearing.area, 0)} = ${f(tau)} MPa; ${fv.line}` },
      );
    }
    const intro = [
      `arm a = (t − s)/2 = (${spec.wheels.track_mm} − ${spec.axle.bearing_span_mm})/2 = ${g.a} mm; nave inner face to wheel plane L_nave/2 = ${g.naveArm} mm; wheel radius r = ${g.wheelRadius} mm`,
      `at the bearing: ${g.bearing.label} (width × height), W = b·h²/6 = ${f(g.bearing.W, 0)} mm³, A = ${f(g.bearing.area, 0)} mm²; in the nave: ${g.spindle.label} (the bore), W = π·d³/32 = ${f(g.spindle.W, 0)} mm³`,
      'F_lat·r is added to N_w·a: on the outer wheel the two moments oppose, on the inner they add; the outer wheel\'s loads added bound both wheels',
      ...bending.working,
      ...shear.working.filter((l) => !bending.working.includes(l)),
    ];
    return [memberFinding({ rule: this.id, part: part.label, unit: 'MPa', checks, umax: ctx.limit('utilisation_max'), intro, sources: [...bending.sources, ...shear.sources], fix: 'Deepen the axle (strength rises with the square of the height), move the box bearings outward or the wheels inward to shorten the arm, use a stronger species, or use selected straight-grained stock (set its grade).' })];
  },
};
