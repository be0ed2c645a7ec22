import type { RulesData } from '../data/rules-data.ts';
import type { PartMass } from './part-mass.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { speciesDensity } from './species-density.ts';
import { strapRuns } from './strap-runs.ts';
import { layout, type Layout } from './layout.ts';
import { jointPlace, lashingLength } from './lashing-geometry.ts';
import { axleBar, frameBar } from './spec-sections.ts';
import { tyreMass } from './tyre-mass.ts';

// Mass and centre of mass of every part (mechanics note, section 2). Lengths
// in mm, volumes in m^3, masses in kg.

const M3_PER_MM3 = 1e-9;
const fmt = (v: number, d = 3) => Number(v.toFixed(d)).toString();

export interface MassModel {
  parts: PartMass[];
  layout: Layout;
  rolling: Totals;
  yoke: Totals;
  total: Totals;
}

export interface Totals {
  mass_kg: number;
  x_mm: number;
  y_mm: number;
  z_mm: number;
}

export function totals(parts: readonly PartMass[]): Totals {
  const m = parts.reduce((s, p) => s + p.mass_kg, 0);
  const at = (k: 'x_mm' | 'y_mm' | 'z_mm') => (m > 0 ? parts.reduce((s, p) => s + p.mass_kg * p[k], 0) / m : 0);
  return { mass_kg: m, x_mm: at('x_mm'), y_mm: at('y_mm'), z_mm: at('z_mm') };
}

export function massModel(spec: CheckedSpecification, data: RulesData): MassModel {
  const lay = layout(spec);
  const M = spec.moisture_content_pct;
  const rho = (species: string) => speciesDensity(data, species, M);
  const timber = (part: string, species: string, volMm3: number, at: { x: number; y: number; z: number }, group: PartMass['group'], shape: string): PartMass => {
    const density = rho(species);
    const mass = volMm3 * M3_PER_MM3 * density;
    return { part, group, mass_kg: mass, x_mm: at.x, y_mm: at.y, z_mm: at.z, measured: false, basis: `${shape} = ${fmt(volMm3 * M3_PER_MM3, 5)} m³ × ${fmt(density, 0)} kg/m³ (${species} at ${M} % moisture)` };
  };
  const measured = (p: PartMass, mass?: number): PartMass =>
    mass === undefined ? p : { ...p, mass_kg: mass, measured: true, basis: `measured ${mass} kg (computed: ${fmt(p.mass_kg)} kg)` };

  const parts: PartMass[] = [];
  parts.push(...boxParts(spec, data, lay, timber));
  const axle = axleBar(spec);
  parts.push(measured(timber('axle', spec.axle.species, spec.axle.length_mm * axle.area, { x: spec.axle.x_mm, y: 0, z: lay.axleZ }, 'rolling', axle.round ? `${spec.axle.length_mm} mm × π/4 × ${axle.width}² mm²` : `${spec.axle.length_mm} × ${axle.width} × ${axle.depth} mm`), spec.axle.mass_kg));
  const wheel = wheelMass(spec, data, lay, rho);
  for (const side of [1, -1]) {
    const at = { x: spec.axle.x_mm, y: (side * spec.wheels.track_mm) / 2, z: lay.axleZ };
    const p: PartMass = { part: side > 0 ? 'wheel, left' : 'wheel, right', group: 'rolling', mass_kg: wheel.mass, x_mm: at.x, y_mm: at.y, z_mm: at.z, measured: false, basis: wheel.basis };
    parts.push(measured(p, spec.wheels.mass_kg));
  }
  if (lay.pole.ok) {
    const path = lay.pole.path;
    const section = spec.pole.width_mm * spec.pole.height_mm;
    parts.push(measured(timber('pole', spec.pole.species, path.totalLength * section, { x: path.centroid.x, y: 0, z: path.centroid.z }, 'rolling', `${fmt(path.totalLength, 0)} mm developed × ${spec.pole.width_mm} × ${spec.pole.height_mm} mm`), spec.pole.mass_kg));
  }
  parts.push(measured(timber('yoke', spec.yoke.species, spec.yoke.length_mm * spec.yoke.width_mm * spec.yoke.height_mm, { x: spec.pole.yoke_x_mm, y: 0, z: spec.pole.yoke_height_mm }, 'yoke', `${spec.yoke.length_mm} × ${spec.yoke.width_mm} × ${spec.yoke.height_mm} mm`), spec.yoke.mass_kg));
  for (const l of spec.lashings) {
    const place = jointPlace(l.joint, spec, lay);
    const length = lashingLength(l.wraps, place.wrapPerimeter);
    const density = data.leathers[l.material].density_kg_per_m3.value;
    const mass = length * l.width_mm * l.thickness_mm * M3_PER_MM3 * density;
    parts.push({ part: `lashing, ${l.joint}`, group: place.group, mass_kg: mass, x_mm: place.x, y_mm: place.y, z_mm: place.z, measured: false, basis: `${l.wraps} wraps × ${fmt(place.wrapPerimeter, 0)} mm + tails = ${fmt(length, 0)} mm × ${l.width_mm} × ${l.thickness_mm} mm × ${density} kg/m³ (${l.material})` });
  }
  for (const c of spec.crew) {
    parts.push({ part: `crew, ${c.role}`, group: 'rolling', variable: true, mass_kg: c.mass_kg, x_mm: c.x_mm, y_mm: c.y_mm, z_mm: lay.floorTopZ + c.cg_height_mm, measured: true, basis: `given ${c.mass_kg} kg, centre of mass ${c.cg_height_mm} mm above the floor` });
  }
  for (const l of spec.loads) {
    parts.push({ part: `load, ${l.name}`, group: 'rolling', variable: true, mass_kg: l.mass_kg, x_mm: l.x_mm, y_mm: l.y_mm, z_mm: l.z_mm, measured: true, basis: `given ${l.mass_kg} kg` });
  }
  const rolling = totals(parts.filter((p) => p.group === 'rolling'));
  const yoke = totals(parts.filter((p) => p.group === 'yoke'));
  return { parts, layout: lay, rolling, yoke, total: totals(parts) };
}

type TimberFn = (part: string, species: string, volMm3: number, at: { x: number; y: number; z: number }, group: PartMass['group'], shape: string) => PartMass;

// The box: frame rails on a rectangle whose two front corners are rounded
// where the front rail is steam-bent, the strap floor, and the siding; a
// measured box mass replaces all three.
function boxParts(spec: CheckedSpecification, data: RulesData, lay: Layout, timber: TimberFn): PartMass[] {
  const floor = spec.box.floor;
  const f = floor.frame;
  const bar = frameBar(spec);
  const a = floor.depth_mm + bar.width;
  const b = floor.width_mm + bar.width;
  const rc = f.bend_radius_mm ?? 0;
  const railLength = 2 * (a + b) - (4 - Math.PI) * rc; // two quarter-circle corners replace 2 x 2rc of straight rail
  const centre = { x: floor.depth_mm / 2, y: 0 };
  const section = bar.round ? `π/4 × ${bar.width}² mm²` : `${bar.width} × ${bar.depth} mm`;
  const parts: PartMass[] = [
    timber('floor frame', f.species, railLength * bar.area, { ...centre, z: lay.frameZ }, 'rolling', `${fmt(railLength, 0)} mm of ${bar.round ? 'round bar' : 'rail'} × ${section}`),
  ];
  const s = spec.floor_straps;
  const runs = strapRuns(spec);
  const strapLength = runs.reduce((sum, r) => sum + r.count * r.length, 0);
  const leather = data.leathers[s.material].density_kg_per_m3.value;
  parts.push({ part: 'floor straps', group: 'rolling', mass_kg: strapLength * s.width_mm * s.thickness_mm * M3_PER_MM3 * leather, x_mm: centre.x, y_mm: 0, z_mm: lay.floorTopZ, measured: false, basis: `${runs.map((r) => `${r.count} × (${r.span} + 2 × ${r.wrap}) mm`).join(' + ')} = ${fmt(strapLength, 0)} mm × ${s.width_mm} × ${s.thickness_mm} mm × ${leather} kg/m³ (${s.material})` });
  if (spec.box.siding_mass_kg > 0) {
    parts.push({ part: 'siding', group: 'rolling', mass_kg: spec.box.siding_mass_kg, x_mm: centre.x, y_mm: 0, z_mm: lay.floorTopZ + spec.box.siding_height_mm, measured: true, basis: `given ${spec.box.siding_mass_kg} kg, ${spec.box.siding_height_mm} mm above the floor` });
  }
  if (spec.box.mass_kg === undefined) return parts;
  const t = totals(parts);
  return [{ part: 'box', group: 'rolling', mass_kg: spec.box.mass_kg, x_mm: t.x_mm, y_mm: t.y_mm, z_mm: t.z_mm, measured: true, basis: `measured ${spec.box.mass_kg} kg (computed: ${fmt(t.mass_kg)} kg); centre of mass from the computed parts` }];
}

// One wheel: nave (cylinder less the bore), spokes, felloe ring, tyre.
function wheelMass(spec: CheckedSpecification, data: RulesData, lay: Layout, rho: (s: string) => number): { mass: number; basis: string } {
  const w = spec.wheels;
  const nave = (Math.PI / 4) * (w.nave.diameter_mm ** 2 - w.nave.bore_mm ** 2) * w.nave.length_mm * M3_PER_MM3 * rho(w.nave.species);
  const spokes = w.spokes * lay.spokeLength * w.spoke.width_mm * w.spoke.thickness_mm * M3_PER_MM3 * rho(w.spoke.species);
  const felloe = Math.PI * (lay.felloeOuter ** 2 - lay.felloeInner ** 2) * w.felloe.width_mm * M3_PER_MM3 * rho(w.felloe.species);
  const tyre = tyreMass(spec, data, lay);
  const mass = nave + spokes + felloe + (tyre === null ? 0 : tyre.mass);
  return { mass, basis: `nave ${fmt(nave)} + ${w.spokes} spokes of ${fmt(lay.spokeLength, 0)} mm ${fmt(spokes)} + felloe ${fmt(felloe)}${tyre ? ` + ${tyre.basis}` : ''} = ${fmt(mass)} kg` };
}
