import type { ModelView } from '../../pipeline/define-model.ts';
import type { Figure } from '../../result/figure.ts';
import type { FloorModel } from './floor-model.ts';

// The strap floor's named figures. NaN where the floor was not solved
// (floor.convergence says why).
export function floorFigures(a: ModelView<'floorStatic' | 'floorBump'>): Record<string, Figure> {
  const stat = a.floorStatic;
  const bump = a.floorBump;
  const clearance = floorClearanceMin([stat, bump]);
  return {
    strap_tension_static_max: { value: stat.maxTension_N, unit: 'N' },
    strap_tension_max: { value: Math.max(stat.maxTension_N, bump.maxTension_N), unit: 'N' },
    floor_sag_static_max: { value: Math.max(...stat.crew.map((c) => c.sag_mm)), unit: 'mm' },
    floor_stiffness: { value: stat.crew[0].tangentStiffness_N_per_mm, unit: 'N/mm' },
    // Left out where no part lies under the floor or the floor was not solved (it does not apply).
    ...(clearance === null ? {} : { floor_clearance_min: { value: clearance, unit: 'mm' } }),
  };
}

/**
 * The least clearance left between the sagging floor and the top of any part
 * beneath it (pole, axle) in any of the cases given, mm; null where no part
 * lies under the floor or a case was not solved. The stone case joins the
 * list once its floor model exists.
 */
export function floorClearanceMin(cases: readonly FloorModel[]): number | null {
  if (cases.some((m) => !m.converged)) return null;
  const left = cases.flatMap((m) => m.clearances.map((c) => c.clearance_mm - c.sag_mm));
  return left.length ? Math.min(...left) : null;
}
