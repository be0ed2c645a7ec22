import type { Param, RulesData } from '../data/rules-data.ts';
import type { Layout } from '../model/layout.ts';
import { speciesDensity } from '../model/species-density.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { cutlistFactor } from './cutlist-factors.ts';
import type { CutListItem } from './cutting-result.ts';
import { draughtParts } from './draught-parts.ts';
import { extraParts } from './extra-parts.ts';
import { frameParts } from './frame-parts.ts';
import { fmt, type PartDemand } from './part-demand.ts';
import { roughSize, type Allowances } from './rough-size.ts';
import type { WheelGeometry } from './wheel-geometry.ts';
import { wheelParts } from './wheel-parts.ts';

// Every timber part the specification implies, with its rough size, grain,
// spares for steam bending, rough volume and finished mass (mechanics note,
// section 9). The siding is given only as a mass and is not a part here
// (stock.siding says so).

const M3_PER_MM3 = 1e-9;

export function cutList(spec: CheckedSpecification, data: RulesData, lay: Layout, wheel: WheelGeometry): CutListItem[] {
  const allowances: Allowances = {
    face_mm: spec.stock.allowance.face_mm,
    end_mm: spec.stock.allowance.end_mm,
    bendEnd: cutlistFactor(data, 'bend_end_allowance_mm'),
    green: spec.stock.green,
    M: spec.moisture_content_pct,
  };
  const good = cutlistFactor(data, 'bend_good_fraction');
  const demands = [...frameParts(spec), ...draughtParts(spec, data, lay), ...wheelParts(spec, lay, wheel), ...extraParts(spec)];
  return demands.map((d) => item(d, allowances, good, spec.moisture_content_pct, data));
}

function item(d: PartDemand, a: Allowances, goodParam: Param, M: number, data: RulesData): CutListItem {
  const { value: good, source: goodSource } = goodParam;
  const { rough, lines, allowances } = roughSize(d, a, data);
  const spares = d.steamBent ? Math.ceil(d.quantity / good - 1e-9) - d.quantity : 0;
  const density = speciesDensity(data, d.species, M);
  const mass = d.volume_mm3 * M3_PER_MM3 * density;
  const basis = [
    `finished: ${d.volumeBasis}`,
    ...(d.blankBasis ? [d.blankBasis] : []),
    ...lines,
    `mass: ${fmt(d.volume_mm3 * M3_PER_MM3, 5)} m³ × ${fmt(density, 0)} kg/m³ (${d.species} at ${M} % moisture) = ${fmt(mass, 3)} kg`,
    ...(d.steamBent ? [`spares: ceil(${d.quantity} / ${good}) − ${d.quantity} = ${spares} (cutlist.bend_good_fraction: ${goodSource})`] : []),
  ];
  return {
    part: d.part,
    quantity: d.quantity,
    species: d.species,
    finished: d.finished,
    rough,
    grain: grainText(d),
    steam_bent: d.steamBent,
    spares,
    volume_m3: rough.length_mm * rough.width_mm * rough.thickness_mm * M3_PER_MM3,
    mass_kg: mass,
    basis: basis.join('\n'),
    allowances: d.steamBent ? [...allowances, { what: 'spares', from: 'cutlist.bend_good_fraction', value: good, unit: '', sources: goodParam.sources }] : allowances,
  };
}

function grainText(d: PartDemand): string {
  const grade = d.grade === 'selected' ? 'straight grain, riven or clear (selected)' : 'straight grain, sawn';
  return [grade, d.grainNote, d.steamBent ? 'free of knots and run-out for steam bending' : undefined].filter(Boolean).join('; ');
}
