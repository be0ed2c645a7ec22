import type { CheckedSpecification } from '../spec/spec.types.ts';
import { frameBar } from './spec-sections.ts';

// The steam-bent parts of a build and the numbers the bend check needs
// (design basis, section 6). The thickness is the part's dimension in the
// plane of the bend; the radius compared is the inner (concave) face's, the
// radius of the bending form, whatever line the specification measures on.

export interface BentPart {
  /** A stable id of the part: `pole`, `felloe`, `frame`. */
  id: 'pole' | 'felloe' | 'frame';
  part: string;
  /** Key of the radius in the specification. */
  key: string;
  species: string;
  /** The radius as given, mm, and the line it is measured on. */
  givenRadius: number;
  measuredOn: 'centre line' | 'inner face';
  thickness: number;
  thicknessName: string;
  innerRadius: number;
  strap: boolean;
}

export function bentParts(spec: CheckedSpecification): BentPart[] {
  const out: BentPart[] = [];
  const { pole } = spec;
  if (pole.bend_radius_mm !== undefined) {
    out.push({ id: 'pole', part: 'pole', key: 'pole.bend_radius_mm', species: pole.species, givenRadius: pole.bend_radius_mm, measuredOn: 'centre line', thickness: pole.height_mm, thicknessName: 'height', innerRadius: pole.bend_radius_mm - pole.height_mm / 2, strap: pole.bend_strap });
  }
  const felloe = spec.wheels.felloe;
  if (felloe.bend_radius_mm !== undefined) {
    out.push({ id: 'felloe', part: 'felloe', key: 'wheels.felloe.bend_radius_mm', species: felloe.species, givenRadius: felloe.bend_radius_mm, measuredOn: 'inner face', thickness: felloe.depth_mm, thicknessName: 'depth', innerRadius: felloe.bend_radius_mm, strap: felloe.bend_strap });
  }
  const frame = spec.box.floor.frame;
  if (frame.bend_radius_mm !== undefined) {
    const bar = frameBar(spec);
    out.push({ id: 'frame', part: 'floor frame front rail', key: 'box.floor.frame.bend_radius_mm', species: frame.species, givenRadius: frame.bend_radius_mm, measuredOn: 'centre line', thickness: bar.width, thicknessName: bar.round ? 'diameter' : 'width in plan', innerRadius: frame.bend_radius_mm - bar.width / 2, strap: frame.bend_strap });
  }
  return out;
}
