import type { CheckedSpecification } from '../spec/spec.types.ts';
import { fmt, prism, type PartDemand } from './part-demand.ts';

/** The parts listed under stock.extra_parts, as given. */
export function extraParts(spec: CheckedSpecification): PartDemand[] {
  return spec.stock.extra_parts.map((x) => {
    const s = prism(x.length_mm, x.width_mm, x.thickness_mm);
    return {
      part: x.name,
      quantity: x.quantity,
      species: x.species,
      grade: x.grade ?? spec.stock.grade,
      orientation: x.orientation ?? spec.stock.orientation,
      finished: s.size,
      blank: s.size,
      volume_mm3: s.volume,
      volumeBasis: `${fmt(x.length_mm)} × ${fmt(x.width_mm)} × ${fmt(x.thickness_mm)} mm (stock.extra_parts)`,
      steamBent: false,
      round: false,
    };
  });
}
