import type { CheckedSpecification } from '../spec/spec.types.ts';
import { fmt, prism, type PartDemand } from './part-demand.ts';

// The floor frame as cut. The rails' centre lines form a rectangle
// a = depth + rail width by b = width + rail width (as in the mass model).
// Jointed corners are taken as halved (common practice): each rail runs to
// the outside of the frame and the halvings take out the overlap, so the
// frame's volume is the mass model's centre-line volume. A steam-bent front
// rail rounds the two front corners and runs on as both sides to the jointed
// rear corners, so it is one blank.

export function frameParts(spec: CheckedSpecification): PartDemand[] {
  const floor = spec.box.floor;
  const f = floor.frame;
  const a = floor.depth_mm + f.width_mm;
  const b = floor.width_mm + f.width_mm;
  const base = { species: f.species, grade: f.grade ?? spec.stock.grade, round: false, orientation: spec.stock.orientation };
  const halving = f.width_mm * f.width_mm * (f.thickness_mm / 2);
  const rail = (part: string, quantity: number, length: number, halvings: number, shape: string): PartDemand => {
    const p = prism(length, f.width_mm, f.thickness_mm);
    return { ...base, part, quantity, finished: p.size, blank: p.size, volume_mm3: p.volume - halvings * halving, volumeBasis: `${shape}, less ${halvings} halvings of ${f.width_mm} × ${f.width_mm} × ${fmt(f.thickness_mm / 2)} mm`, steamBent: false };
  };
  const rear = rail('floor frame rear rail', 1, b + f.width_mm, 2, `${fmt(b + f.width_mm)} mm (centre-line span ${fmt(b)} mm + rail width ${f.width_mm} mm) × ${f.width_mm} × ${f.thickness_mm} mm`);
  const rc = f.bend_radius_mm;
  if (rc === undefined) {
    return [
      rail('floor frame side rail', 2, a + f.width_mm, 2, `${fmt(a + f.width_mm)} mm (centre-line span ${fmt(a)} mm + rail width) × ${f.width_mm} × ${f.thickness_mm} mm`),
      rail('floor frame front rail', 1, b + f.width_mm, 2, `${fmt(b + f.width_mm)} mm (centre-line span ${fmt(b)} mm + rail width) × ${f.width_mm} × ${f.thickness_mm} mm`),
      rear,
    ];
  }
  // Sides from the rear rail's outer face to the bends, two quarter circles, the front between them.
  const side = a - rc + f.width_mm / 2;
  const front = b - 2 * rc;
  const arcs = Math.PI * rc;
  const developed = 2 * side + front + arcs;
  // Against a strap the convex (outer) face keeps the blank's length; without one, take the centre line.
  const convexExtra = f.bend_strap ? Math.PI * (f.width_mm / 2) : 0;
  const bow = rail('floor frame front rail, bent, with the sides', 1, developed, 2, `developed centre line 2 × ${fmt(side)} + ${fmt(front)} + π × ${fmt(rc)} = ${fmt(developed)} mm × ${f.width_mm} × ${f.thickness_mm} mm`);
  bow.steamBent = true;
  bow.blank = { ...bow.finished, length_mm: developed + convexExtra };
  bow.blankBasis = f.bend_strap
    ? `bent against a strap: the blank is the outer face's length, ${fmt(developed)} + 2 quarter turns × π/2 × ${fmt(f.width_mm / 2)} = ${fmt(developed + convexExtra)} mm`
    : `bent without a strap: the blank is the centre line's length, ${fmt(developed)} mm`;
  return [bow, rear];
}
