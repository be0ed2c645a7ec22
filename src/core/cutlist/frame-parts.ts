import { frameBar } from '../model/spec-sections.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { fmt, prism, type PartDemand } from './part-demand.ts';

// The floor frame as cut. The rails' centre lines form a rectangle
// a = depth + rail width by b = width + rail width (as in the mass model).
// Jointed corners are taken as halved (common practice): each rail runs to
// the outside of the frame and the halvings take out the overlap, so the
// frame's volume is the mass model's centre-line volume. A steam-bent front
// rail rounds the two front corners and runs on as both sides to the jointed
// rear corners, so it is one blank. Round bars are listed by their diameter
// (finished width and thickness both the diameter, the square they are
// turned or shaved from) and take the turned parts' shrinkage.

export function frameParts(spec: CheckedSpecification): PartDemand[] {
  const floor = spec.box.floor;
  const f = floor.frame;
  const bar = frameBar(spec);
  const w = bar.width;
  const a = floor.depth_mm + w;
  const b = floor.width_mm + w;
  const base = { species: f.species, grade: f.grade ?? spec.stock.grade, round: bar.round, orientation: spec.stock.orientation };
  // A halving takes half the depth out of a rail's width of length: the area times w/2 (w × w × t/2 for a rectangle).
  const halving = bar.area * (w / 2);
  const section = bar.round ? `π/4 × ${w}² mm²` : `${w} × ${bar.depth} mm`;
  const halvingText = bar.round ? `π/4 × ${w}² × ${fmt(w / 2)} mm` : `${w} × ${w} × ${fmt(bar.depth / 2)} mm`;
  const name = (part: string) => (bar.round ? `${part}, round bar ${w} mm diameter` : part);
  const rail = (part: string, quantity: number, length: number, halvings: number, shape: string): PartDemand => {
    const p = prism(length, w, bar.depth);
    const demand: PartDemand = { ...base, part: name(part), quantity, finished: p.size, blank: p.size, volume_mm3: length * bar.area - halvings * halving, volumeBasis: `${shape}, less ${halvings} halvings of ${halvingText}`, steamBent: false };
    if (bar.round) demand.blankBasis = `turned or shaved round from a square billet ${w} mm on the side`;
    return demand;
  };
  const rear = rail('floor frame rear rail', 1, b + w, 2, `${fmt(b + w)} mm (centre-line span ${fmt(b)} mm + rail width ${w} mm) × ${section}`);
  const rc = f.bend_radius_mm;
  if (rc === undefined) {
    return [
      rail('floor frame side rail', 2, a + w, 2, `${fmt(a + w)} mm (centre-line span ${fmt(a)} mm + rail width) × ${section}`),
      rail('floor frame front rail', 1, b + w, 2, `${fmt(b + w)} mm (centre-line span ${fmt(b)} mm + rail width) × ${section}`),
      rear,
    ];
  }
  // Sides from the rear rail's outer face to the bends, two quarter circles, the front between them.
  const side = a - rc + w / 2;
  const front = b - 2 * rc;
  const arcs = Math.PI * rc;
  const developed = 2 * side + front + arcs;
  // Against a strap the convex (outer) face keeps the blank's length; without one, take the centre line.
  const convexExtra = f.bend_strap ? Math.PI * (w / 2) : 0;
  const bow = rail('floor frame front rail, bent, with the sides', 1, developed, 2, `developed centre line 2 × ${fmt(side)} + ${fmt(front)} + π × ${fmt(rc)} = ${fmt(developed)} mm × ${section}`);
  bow.steamBent = true;
  bow.blank = { ...bow.finished, length_mm: developed + convexExtra };
  bow.blankBasis = [
    ...(bar.round ? [bow.blankBasis] : []),
    f.bend_strap
      ? `bent against a strap: the blank is the outer face's length, ${fmt(developed)} + 2 quarter turns × π/2 × ${fmt(w / 2)} = ${fmt(developed + convexExtra)} mm`
      : `bent without a strap: the blank is the centre line's length, ${fmt(developed)} mm`,
  ].join('; ');
  return [bow, rear];
}
