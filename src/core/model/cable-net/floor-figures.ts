import type { ModelView } from '../../pipeline/define-model.ts';
import type { Figure } from '../../result/figure.ts';

// The strap floor's named figures. NaN where the floor was not solved
// (floor.convergence says why).
export function floorFigures(a: ModelView<'floorStatic' | 'floorBump'>): Record<string, Figure> {
  const stat = a.floorStatic;
  const bump = a.floorBump;
  return {
    strap_tension_static_max: { value: stat.maxTension_N, unit: 'N' },
    strap_tension_max: { value: Math.max(stat.maxTension_N, bump.maxTension_N), unit: 'N' },
    floor_sag_static_max: { value: Math.max(...stat.crew.map((c) => c.sag_mm)), unit: 'mm' },
    floor_stiffness: { value: stat.crew[0].tangentStiffness_N_per_mm, unit: 'N/mm' },
  };
}
