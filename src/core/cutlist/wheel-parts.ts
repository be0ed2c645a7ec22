import type { Layout } from '../model/layout.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { fmt, prism, type PartDemand } from './part-demand.ts';
import type { WheelGeometry } from './wheel-geometry.ts';

// The parts of the two wheels: naves, spokes and felloe pieces, with the
// mass model's geometry (nave: cylinder less the bore; felloe: ring sector).

export function wheelParts(spec: CheckedSpecification, lay: Layout, g: WheelGeometry): PartDemand[] {
  const w = spec.wheels;
  const common = { grade: spec.stock.grade, orientation: spec.stock.orientation };
  const nave = w.nave;
  const naveSize = prism(nave.length_mm, nave.diameter_mm, nave.diameter_mm).size;
  const naves: PartDemand = {
    ...common,
    part: 'nave',
    quantity: 2,
    species: nave.species,
    finished: naveSize,
    blank: naveSize,
    volume_mm3: (Math.PI / 4) * (nave.diameter_mm ** 2 - nave.bore_mm ** 2) * nave.length_mm,
    volumeBasis: `π/4 × (${nave.diameter_mm}² − ${nave.bore_mm}²) × ${nave.length_mm} mm, turned round and bored; mortises not taken out (the spoke tenons fill them)`,
    steamBent: false,
    round: true,
    blankBasis: `turned from a square billet ${nave.diameter_mm} mm on the side`,
  };
  const spoke = prism(g.overall, w.spoke.width_mm, w.spoke.thickness_mm);
  const spokes: PartDemand = {
    ...common,
    grade: w.spoke.grade ?? spec.stock.grade,
    part: 'spoke',
    quantity: 2 * w.spokes,
    species: w.spoke.species,
    finished: spoke.size,
    blank: spoke.size,
    volume_mm3: spoke.volume,
    volumeBasis: `${fmt(g.overall)} mm overall (tenons taken at the full section, an upper bound) × ${w.spoke.width_mm} × ${w.spoke.thickness_mm} mm`,
    steamBent: false,
    round: false,
  };
  return [naves, spokes, felloePiece(spec, lay)];
}

function felloePiece(spec: CheckedSpecification, lay: Layout): PartDemand {
  const f = spec.wheels.felloe;
  const p = f.pieces;
  const theta = (2 * Math.PI) / p;
  const Ro = lay.felloeOuter;
  const Ri = lay.felloeInner;
  const Rm = (Ro + Ri) / 2;
  const finished = prism(Rm * theta, f.depth_mm, f.width_mm).size;
  const part: PartDemand = {
    grade: f.grade ?? spec.stock.grade,
    orientation: spec.stock.orientation,
    part: 'felloe piece',
    quantity: 2 * p,
    species: f.species,
    finished,
    blank: finished,
    volume_mm3: (theta / 2) * (Ro * Ro - Ri * Ri) * f.width_mm,
    volumeBasis: `ring sector 2π/${p} × (${fmt(Ro)}² − ${fmt(Ri)}²)/2 × ${f.width_mm} mm; length given on the mid-depth arc (radius ${fmt(Rm)} mm), section depth × width`,
    steamBent: f.bend_radius_mm !== undefined,
    round: false,
  };
  if (part.steamBent) {
    // Against a strap the convex (outer) face keeps the blank's length; without one, take the mid-depth line.
    const length = (f.bend_strap ? Ro : Rm) * theta;
    part.blank = { ...finished, length_mm: length };
    part.blankBasis = f.bend_strap
      ? `bent against a strap: the blank is the outer face's arc, 2π × ${fmt(Ro)}/${p} = ${fmt(length)} mm`
      : `bent without a strap: the blank is the mid-depth arc, 2π × ${fmt(Rm)}/${p} = ${fmt(length)} mm`;
    return part;
  }
  // A sawn segment comes from a plank that holds the whole curved piece.
  const half = theta / 2;
  const length = half >= Math.PI / 2 ? 2 * Ro : 2 * Ro * Math.sin(half);
  const low = half <= Math.PI / 2 ? Ri * Math.cos(half) : Ro * Math.cos(half);
  part.blank = { length_mm: length, width_mm: Ro - low, thickness_mm: f.width_mm };
  part.blankBasis = `sawn to the curve from a plank that holds the piece: length ${half >= Math.PI / 2 ? `2 R_o = ${fmt(length)}` : `outer chord 2 × ${fmt(Ro)} × sin(π/${p}) = ${fmt(length)}`} mm, width R_o − ${half <= Math.PI / 2 ? `R_i cos(π/${p})` : `R_o cos(π/${p})`} = ${fmt(Ro - low)} mm, thickness the felloe width ${f.width_mm} mm`;
  part.grainNote = 'grain along the chord';
  return part;
}
