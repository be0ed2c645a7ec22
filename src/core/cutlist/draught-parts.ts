import type { RulesData } from '../data/rules-data.ts';
import type { Layout } from '../model/layout.ts';
import { axleBar } from '../model/spec-sections.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { cutlistFactor } from './cutlist-factors.ts';
import { fmt, prism, type PartDemand } from './part-demand.ts';

// Axle, linchpins, pole and yoke. The pole's length is its developed centre
// line (straight run under the floor, the bend, the rise to the yoke), as in
// the mass model. A round axle is listed by its diameter.

export function draughtParts(spec: CheckedSpecification, data: RulesData, lay: Layout): PartDemand[] {
  const { axle, pole, yoke } = spec;
  const orientation = spec.stock.orientation;
  const straight = (part: string, p: { species: string; grade?: PartDemand['grade'] }, length: number, width: number, thickness: number): PartDemand => {
    const s = prism(length, width, thickness);
    return { part, quantity: 1, species: p.species, grade: p.grade ?? spec.stock.grade, orientation, finished: s.size, blank: s.size, volume_mm3: s.volume, volumeBasis: `${fmt(length)} × ${fmt(width)} × ${fmt(thickness)} mm`, steamBent: false, round: false };
  };
  const ab = axleBar(spec);
  const axleRow = straight(ab.round ? `axle, round bar ${ab.width} mm diameter` : 'axle', axle, axle.length_mm, ab.width, ab.depth);
  if (ab.round) {
    axleRow.round = true;
    axleRow.volume_mm3 = axle.length_mm * ab.area;
    axleRow.volumeBasis = `round, π/4 × ${fmt(ab.width)}² × ${fmt(axle.length_mm)} mm`;
    axleRow.blankBasis = `turned or shaved round from a square billet ${ab.width} mm on the side`;
  }
  const out = [axleRow];

  const dFrac = cutlistFactor(data, 'linchpin_diameter_fraction');
  const lFactor = cutlistFactor(data, 'linchpin_length_factor');
  const d = dFrac.value * Math.min(ab.width, ab.depth);
  const L = lFactor.value * ab.depth;
  out.push({
    ...straight('linchpin', axle, L, d, d),
    quantity: 2,
    round: true,
    volume_mm3: (Math.PI / 4) * d * d * L,
    volumeBasis: `round, π/4 × ${fmt(d)}² × ${fmt(L)} mm: diameter ${dFrac.value} × the axle's smaller side ${Math.min(ab.width, ab.depth)} mm (${dFrac.source}); length ${lFactor.value} × the axle height ${ab.depth} mm (${lFactor.source}); same species as the axle (an assumption: an iron pin serves as well)`,
  });

  if (!lay.pole.ok) throw new Error('the pole path has no solution; the specification checks should have refused it');
  const path = lay.pole.path;
  const bent = pole.bend_radius_mm !== undefined;
  const poleRow = straight('pole', pole, path.totalLength, pole.width_mm, pole.height_mm);
  poleRow.volumeBasis = `developed centre line ${fmt(path.runLength)} + ${fmt(path.arcLength)} + ${fmt(path.riseLength)} = ${fmt(path.totalLength)} mm × ${pole.width_mm} × ${pole.height_mm} mm`;
  if (bent) {
    poleRow.steamBent = true;
    // Against a strap the convex (lower) face keeps the blank's length: the centre line plus h/2 per radian of bend.
    const extra = pole.bend_strap ? (pole.height_mm / 2) * path.bendAngle : 0;
    poleRow.blank = { ...poleRow.finished, length_mm: path.totalLength + extra };
    poleRow.blankBasis = pole.bend_strap
      ? `bent against a strap: the blank is the convex face's length, ${fmt(path.totalLength)} + ${fmt(pole.height_mm / 2)} × ${fmt(path.bendAngle, 4)} rad = ${fmt(path.totalLength + extra)} mm`
      : `bent without a strap: the blank is the centre line's length, ${fmt(path.totalLength)} mm`;
  } else if (Math.abs(pole.yoke_height_mm - lay.poleZ) > 0.5) {
    poleRow.blankBasis = 'no bend radius given: the rise meets the run at a kink, which a straight blank cannot make without a joint';
  }
  out.push(poleRow);
  out.push(straight('yoke', yoke, yoke.length_mm, yoke.width_mm, yoke.height_mm));
  return out;
}
