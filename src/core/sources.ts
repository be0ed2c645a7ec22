import type { RulesData, Sourced } from './data/rules-data.ts';
import type { Finding } from './findings/finding.ts';
import type { CheckedSpecification } from './spec/spec.types.ts';

function sourcesOf(node: unknown, out: Set<string>): void {
  if (typeof node !== 'object' || node === null) return;
  if ('source' in node && typeof (node as Sourced).source === 'string') out.add((node as Sourced).source);
  for (const v of Object.values(node)) sourcesOf(v, out);
}

/** Sources of every material and ground the spec uses and every finding cites. */
export function usedSources(spec: CheckedSpecification, data: RulesData, findings: Finding[]): string[] {
  const out = new Set<string>();
  const species = new Set([spec.box.floor.frame.species, spec.axle.species, spec.wheels.nave.species, spec.wheels.spoke.species, spec.wheels.felloe.species, spec.pole.species, spec.yoke.species]);
  for (const s of species) sourcesOf(data.species[s], out);
  const leathers = new Set([spec.floor_straps.material, ...spec.lashings.map((l) => l.material), ...(spec.wheels.tyre ? [spec.wheels.tyre.material] : [])]);
  for (const l of leathers) sourcesOf(data.leathers[l], out);
  sourcesOf(data.grounds[spec.operation.ground], out);
  for (const f of findings) out.add(f.source);
  return [...out].sort();
}
