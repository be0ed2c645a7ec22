import { param } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Layout } from './layout.ts';
import { tyreOf } from './tyre.ts';

// The mass of one tyre: the ring between the felloe's outer face and the
// wheel's radius, by the hide's density for a rawhide or leather tyre and by
// the rules data's iron density for an iron one (rules/parameters/tyre.yaml).

const M3_PER_MM3 = 1e-9;
const fmt = (v: number, d = 3) => Number(v.toFixed(d)).toString();

export function tyreMass(spec: CheckedSpecification, data: RulesData, lay: Layout): { mass: number; basis: string } | null {
  const t = tyreOf(spec);
  if (t === null) return null;
  const volume = Math.PI * (lay.wheelRadius ** 2 - lay.felloeOuter ** 2) * t.width * M3_PER_MM3;
  const density = t.kind === 'iron' ? param(data, 'tyre', 'iron_density_kg_per_m3').value : data.leathers[t.material].density_kg_per_m3.value;
  const mass = volume * density;
  const what = t.kind === 'iron' ? 'iron (tyre.iron_density_kg_per_m3)' : t.material;
  return { mass, basis: `${t.kind} tyre π × (${fmt(lay.wheelRadius, 1)}² − ${fmt(lay.felloeOuter, 1)}²) × ${t.width} mm = ${fmt(volume, 6)} m³ × ${density} kg/m³ (${what}) = ${fmt(mass)} kg` };
}
