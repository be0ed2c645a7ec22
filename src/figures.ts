import type { Analysis } from './engine/analysis.ts';
import type { Figure } from './result/check-result.ts';
import { G } from './units/units.ts';

/** The named figures of a check; later families add theirs here. */
export function figures(a: Analysis): Record<string, Figure> {
  const cases = a.loadCases;
  const stat = cases.find((c) => c.id === 'static')!;
  const yoke = cases.map((c) => c.yoke_load_N);
  const { rolling, total } = a.mass;
  return {
    total_mass: { value: total.mass_kg, unit: 'kg' },
    rolling_mass: { value: rolling.mass_kg, unit: 'kg' },
    cg_x: { value: rolling.x_mm, unit: 'mm' },
    cg_z: { value: rolling.z_mm, unit: 'mm' },
    yoke_load: { value: stat.yoke_load_N, unit: 'N' },
    yoke_load_per_horse: { value: stat.per_horse_N, unit: 'N' },
    yoke_load_min: { value: Math.min(...yoke), unit: 'N' },
    yoke_load_max: { value: Math.max(...yoke), unit: 'N' },
    axle_load: { value: stat.axle_load_N, unit: 'N' },
    yoke_mass: { value: a.mass.yoke.mass_kg, unit: 'kg' },
    total_weight: { value: total.mass_kg * G, unit: 'N' },
  };
}
