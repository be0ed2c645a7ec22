import { param } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { WorkingStep } from '../findings/finding.ts';
import { num, step } from '../findings/working.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { mm } from '../units/units.ts';

// Rolling resistance in two parts (design basis, section 3). The soil's part
// comes from the normal force acting a little ahead of the contact, so the
// ground's resultant passes through the hub: about the contact point it has
// the arm (h_y - r). The hub's friction is a torque at the hub, equal to a
// force at the ground with the arm h_y. Counting all of it with the arm h_y
// overstates the load on the yoke and hides yoke lift.

export interface RollingResistance {
  /** Soil resistance coefficient at this wheel's diameter (Morin: inversely with the diameter). */
  soil: number;
  /** Hub friction as a coefficient of the wheel load: mu_j * r_j / r. */
  hub: number;
  /** Both, per newton on the wheels: the pull needed at constant speed. */
  total: number;
  /** The moment arm coefficient about the contact, m: (h_y - r) * soil + h_y * hub. */
  couple_m: number;
  working: WorkingStep[];
  sources: string[];
}

export const ROLLING_PARAMS = ['rolling.reference_wheel_diameter_mm', 'rolling.journal_friction'] as const;

export function rollingResistance(spec: CheckedSpecification, data: RulesData): RollingResistance {
  const ground = data.grounds[spec.operation.ground];
  const dRef = param(data, 'rolling', 'reference_wheel_diameter_mm');
  const muJ = param(data, 'rolling', 'journal_friction');
  const D = spec.wheels.diameter_mm;
  const r = mm(D / 2);
  const rj = mm(spec.wheels.nave.bore_mm / 2);
  const hy = mm(spec.pole.yoke_height_mm);
  const soil = (ground.soil_resistance.value * dRef.value) / D;
  const hub = (muJ.value * rj) / r;
  const couple = (hy - r) * soil + hy * hub;
  return {
    soil,
    hub,
    total: soil + hub,
    couple_m: couple,
    working: [
      step('C_s = C_s,ref·D_ref/D (soil, Morin)', `${num(ground.soil_resistance.value)} × ${num(dRef.value, 'mm')} / ${num(D, 'mm')}`, soil, '1'),
      step('C_b = mu_j·r_j/r (hub friction)', `${num(muJ.value)} × ${num(rj * 1000, 'mm')} / ${num(r * 1000, 'mm')}`, hub, '1'),
      step('c = (h_y − r)·C_s + h_y·C_b (their arms about the contact)', `(${num(hy)} − ${num(r)}) × ${num(soil)} + ${num(hy)} × ${num(hub)}`, couple, 'm'),
    ],
    sources: [...new Set([...ground.soil_resistance.sources, ...dRef.sources, ...muJ.sources, 'morin-king-1894', 'design-basis-balance'])],
  };
}
