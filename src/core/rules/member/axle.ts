import type { MemberCase } from '../../model/member-cases.ts';
import { armMoment, axleArm } from '../../model/members/axle-arm.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { timberPart } from '../../model/timber/timber-part.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { STRESS_MESSAGES } from './member-messages.ts';

export const axleMember = defineRule({
  id: 'member.axle',
  title: 'Axle arm strength',
  checks: 'Bending of the axle arm at the box bearing and at the nave, and shear at the bearing, under the wheel load standing, over a bump, braking and on the outer wheel in the design turn, against the design strength of the axle timber.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials'],
  needs: ['memberCases'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: [],
  messages: STRESS_MESSAGES,
  run(ctx) {
    const { spec, data } = ctx;
    const part = timberPart(spec, 'axle');
    const bending = timberStrength(data, part, 'bending', spec.moisture_content_pct);
    const shear = timberStrength(data, part, 'shear', spec.moisture_content_pct);
    const g = axleArm(spec);
    const bendingAt = (c: MemberCase, mode: string, armName: string, arm: number, Wname: string, W: number) => {
      const M = armMoment(c.wheel_N, c.wheelLateral_N, arm, g.wheelRadius);
      const lat = c.wheelLateral_N;
      const moment =
        lat > 0
          ? step(`M = N_w·${armName} + F_lat·r`, `${num(c.wheel_N)} × ${num(arm)} + ${num(lat)} × ${num(g.wheelRadius)}`, M, 'N·mm')
          : step(`M = N_w·${armName}`, `${num(c.wheel_N)} × ${num(arm)}`, M, 'N·mm');
      return strengthCheck(c, mode, M / W, bending, bending.design(c.duration, c.gammaM), [moment, step(`σ = M/${Wname}`, `${num(M)} / ${num(W)}`, M / W, 'MPa')]);
    };
    const checks: CaseCheck[] = ctx.models.memberCases.flatMap((c) => {
      const tau = (g.bearing.shearFactor * c.wheel_N) / g.bearing.area;
      return [
        bendingAt(c, 'bending at the bearing', 'a', g.a, 'W_bearing', g.bearing.W),
        bendingAt(c, 'bending at the nave', 'L_nave/2', g.naveArm, 'W_nave', g.spindle.W),
        strengthCheck(c, 'shear at the bearing', tau, shear, shear.design(c.duration, c.gammaM), [step(`τ = ${g.bearing.formulas.shearFactor}·N_w/A`, `${num(g.bearing.shearFactor)} × ${num(c.wheel_N)} / ${num(g.bearing.area)}`, tau, 'MPa')]),
      ];
    });
    ctx.report(
      stressReport({
        subject: 'axle.arm',
        label: 'axle arm',
        part: part.label,
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          step('a = (t − s)/2', `(${num(spec.wheels.track_mm)} − ${num(spec.axle.bearing_span_mm)})/2`, g.a, 'mm'),
          step('L_nave/2 (nave inner face to wheel plane)', '', g.naveArm, 'mm'),
          step('r (wheel radius)', '', g.wheelRadius, 'mm'),
          `at the bearing: ${g.bearing.label}${g.bearing.label.includes('rectangle') ? ' (width × height)' : ''}`,
          step(`W_bearing = ${g.bearing.formulas.W[0]}`, g.bearing.formulas.W[1], g.bearing.W, 'mm³'),
          step(`A = ${g.bearing.formulas.area[0]}`, g.bearing.formulas.area[1], g.bearing.area, 'mm²'),
          `in the nave: ${g.spindle.label} (the bore)`,
          step('W_nave = π·d³/32', `π × ${num(spec.wheels.nave.bore_mm)}³/32`, g.spindle.W, 'mm³'),
          "F_lat·r is added to N_w·a: on the outer wheel the two moments oppose, on the inner they add; the outer wheel's loads added bound both wheels",
          ...bending.working,
          ...shear.working.filter((l) => !bending.working.includes(l)),
        ],
        sources: [...bending.sourceIds, ...shear.sourceIds],
        fix: 'Deepen the axle (strength rises with the square of the height), move the box bearings outward or the wheels inward to shorten the arm, use a stronger species, or use selected straight-grained stock (set its grade).',
      }),
    );
  },
});
