import type { CheckedSpecification } from '../../spec/spec.types.ts';
import type { Layout } from '../layout.ts';
import { eulerLoad } from '../beam-formulas.ts';
import { rectangle, type Section } from '../sections.ts';

// The pole as a cantilever from where it leaves the box to the yoke
// (mechanics note, section 6): M = R_pole·L_f + |T|·dz. Lengths in mm.

export interface PoleCantilever {
  /** Horizontal reach from the root to the yoke: the arm of the vertical pole load. */
  reach: number;
  /** Rise of the centre line from the root to the yoke: the arm of the pull along the pole. */
  rise: number;
  /** Developed length from the root to the yoke (bend and rise): the strut length. */
  strutLength: number;
  section: Section;
}

export function poleCantilever(spec: CheckedSpecification, lay: Layout): PoleCantilever {
  const reach = spec.pole.yoke_x_mm - spec.pole.root_x_mm;
  const rise = spec.pole.yoke_height_mm - lay.poleZ;
  const strutLength = lay.pole.ok ? lay.pole.path.arcLength + lay.pole.path.riseLength : Math.hypot(reach, rise);
  return { reach, rise, strutLength, section: rectangle(spec.pole.width_mm, spec.pole.height_mm) };
}

/** Bending moment at the root, N·mm: magnitudes added, the safe side under draught. */
export function rootMoment(g: PoleCantilever, pole_N: number, axial_N: number): number {
  return Math.abs(pole_N) * g.reach + Math.abs(axial_N) * Math.abs(g.rise);
}

/** Euler load of the pole as a strut, N: P_cr = π² E I_min / (K L)², E in MPa and lengths in mm. */
export function poleEulerLoad(g: PoleCantilever, E05_MPa: number, K: number): number {
  return eulerLoad(E05_MPa, g.section.Imin, g.strutLength, K);
}
