import { param } from './data/param.ts';
import type { RulesData, SourceEntry } from './data/rules-data.ts';
import { tyreOf } from './model/tyre.ts';
import type { Finding } from './findings/finding.ts';
import type { CheckedSpecification } from './spec/spec.types.ts';

/** A source as the result lists it: its catalogue entry under its id. */
export interface CitedSource extends SourceEntry {
  id: string;
}

function idsOf(node: unknown, out: Set<string>): void {
  if (typeof node !== 'object' || node === null) return;
  const ids = (node as { sources?: unknown }).sources;
  if (Array.isArray(ids)) for (const id of ids) out.add(String(id));
  for (const v of Object.values(node)) idsOf(v, out);
}

/** Every source the materials and ground of the build and the findings cite, in catalogue order. */
export function usedSources(spec: CheckedSpecification, data: RulesData, findings: readonly Finding[]): CitedSource[] {
  const ids = new Set<string>();
  const species = new Set([spec.box.floor.frame.species, spec.axle.species, spec.wheels.nave.species, spec.wheels.spoke.species, spec.wheels.felloe.species, spec.pole.species, spec.yoke.species]);
  for (const s of species) if (Object.hasOwn(data.species, s)) idsOf(data.species[s], ids);
  const tyre = tyreOf(spec);
  const leathers = new Set([spec.floor_straps.material, ...spec.lashings.map((l) => l.material), ...(tyre?.kind === 'rawhide' ? [tyre.material] : [])]);
  if (tyre?.kind === 'iron') for (const id of param(data, 'tyre', 'iron_density_kg_per_m3').sources) ids.add(id);
  for (const l of leathers) if (Object.hasOwn(data.leathers, l)) idsOf(data.leathers[l], ids);
  if (Object.hasOwn(data.grounds, spec.operation.ground)) idsOf(data.grounds[spec.operation.ground], ids);
  for (const f of findings) for (const id of f.sources) ids.add(id);
  return Object.keys(data.sources)
    .filter((id) => ids.has(id))
    .map((id) => ({ id, ...data.sources[id] }));
}
