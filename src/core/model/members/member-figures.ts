import { ruleParam } from '../../data/param.ts';
import type { ModelView } from '../../pipeline/define-model.ts';
import type { Figure } from '../../result/figure.ts';
import { stiffness05 } from '../timber/design-strength.ts';
import { timberPart } from '../timber/timber-part.ts';
import { armMoment, axleArm } from './axle-arm.ts';
import { poleCantilever, poleEulerLoad, rootMoment } from './pole-cantilever.ts';

// Member figures with the crew as placed, standing, no dynamic factor: the
// axle's bending stress at the bearing, the pole's at its root, and the
// pole's Euler load as a strut (5th-percentile modulus, member.pole's K).
export function memberFigures(a: ModelView<'staticCase' | 'mass'>): Record<string, Figure> {
  const stat = a.staticCase;
  const arm = axleArm(a.spec);
  const pole = poleCantilever(a.spec, a.mass.layout);
  const K = ruleParam(a.data, 'member.pole', 'effective_length_factor');
  const E = stiffness05(a.data, timberPart(a.spec, 'pole'), a.spec.moisture_content_pct);
  return {
    axle_stress_static: { value: armMoment(stat.axle_load_N / 2, 0, arm.a, arm.wheelRadius) / arm.bearing.W, unit: 'MPa' },
    pole_stress_static: { value: rootMoment(pole, stat.pole_load_N, 0) / pole.section.W, unit: 'MPa' },
    pole_buckling_load: { value: poleEulerLoad(pole, E.fk, K.value), unit: 'N' },
  };
}
