import type { RulesData } from '../data/rules-data.ts';
import { jointPlace, lashingLength, LASHING_TAIL_MM } from '../model/lashing-geometry.ts';
import type { Layout } from '../model/layout.ts';
import { strapRuns } from '../model/strap-runs.ts';
import { tyreOf } from '../model/tyre.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { cutlistFactor, usableHide } from './cutlist-factors.ts';
import type { HideNeed, LeatherItem } from './cutting-result.ts';
import { fmt } from './part-demand.ts';
import type { WheelGeometry } from './wheel-geometry.ts';

// Leather and rawhide as cut (mechanics note, section 9): the floor straps,
// the lashings and the tyres, and the hides they take. Lengths in mm.

const M2_PER_MM2 = 1e-6;

export function leatherList(spec: CheckedSpecification, data: RulesData, lay: Layout, wheel: WheelGeometry): { items: LeatherItem[]; hides: HideNeed[] } {
  const items: LeatherItem[] = [];
  const s = spec.floor_straps;
  const f = spec.box.floor.frame;
  for (const r of strapRuns(spec)) {
    if (r.count === 0) continue;
    const across = r.direction === 'front-to-back' ? `floor width ${spec.box.floor.width_mm}` : `floor depth ${spec.box.floor.depth_mm}`;
    items.push({
      item: `floor straps, ${r.direction}`,
      material: s.material,
      quantity: r.count,
      width_mm: s.width_mm,
      thickness_mm: s.thickness_mm,
      length_mm: r.length,
      area_m2: r.count * r.length * s.width_mm * M2_PER_MM2,
      basis: `${r.count} straps = floor(${across} / pitch ${s.pitch_mm}); each the clear span ${fmt(r.span)} + 2 × one turn round the rail 2 × (${f.width_mm} + ${f.thickness_mm}) = ${fmt(r.length)} mm (as the mass model; straps by rounded corners are shorter, so this is the safe side)`,
    });
  }
  for (const l of spec.lashings) {
    const place = jointPlace(l.joint, spec, lay);
    const anchor = l.anchor_turns ?? 0;
    const turns = l.wraps + 2 * anchor;
    const length = lashingLength(turns, place.wrapPerimeter);
    items.push({
      item: `lashing, ${l.joint}`,
      material: l.material,
      quantity: 1,
      width_mm: l.width_mm,
      thickness_mm: l.thickness_mm,
      length_mm: length,
      area_m2: length * l.width_mm * M2_PER_MM2,
      basis: `(${l.wraps} wraps${anchor ? ` + 2 ends × ${anchor} anchor turns, each taken at the wrap's perimeter, the safe side` : ''}) × ${fmt(place.wrapPerimeter)} mm round both members + 2 tails × ${LASHING_TAIL_MM} mm (common practice) = ${fmt(length)} mm; a strip this long is cut spirally round the hide or joined (common practice)`,
    });
  }
  // An iron tyre is the smith's work, not cut from a hide: the wheel setting-out gives its length.
  const tyre = tyreOf(spec);
  if (tyre !== null && tyre.kind === 'rawhide' && wheel.tyreLength !== null) {
    items.push({
      item: 'tyre',
      material: tyre.material,
      quantity: 2,
      width_mm: tyre.width,
      thickness_mm: tyre.thickness,
      length_mm: wheel.tyreLength,
      area_m2: 2 * wheel.tyreLength * tyre.width * M2_PER_MM2,
      basis: `one a wheel, π × (${spec.wheels.diameter_mm} − ${tyre.thickness}) = ${fmt(wheel.tyreLength)} mm at mid-thickness (see the wheel setting-out)`,
    });
  }
  return { items, hides: hideNeeds(items, data) };
}

function hideNeeds(items: LeatherItem[], data: RulesData): HideNeed[] {
  const waste = cutlistFactor(data, 'hide_waste_factor');
  const materials = [...new Set(items.map((i) => i.material))];
  return materials.map((material) => {
    const area = items.filter((i) => i.material === material).reduce((sum, i) => sum + i.area_m2, 0);
    const hide = usableHide(data, material);
    const hides = Math.ceil((area * waste.value) / hide.value - 1e-9);
    return {
      material,
      area_m2: area,
      usable_hide_m2: hide.value,
      waste_factor: waste.value,
      hides,
      basis: `ceil(${fmt(area, 3)} m² × ${waste.value} / ${hide.value} m²) = ${hides} (cutlist.hide_waste_factor: ${waste.source}; cutlist.${hide.name}: ${hide.source})`,
    };
  });
}
