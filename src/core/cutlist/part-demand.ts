import type { Grade } from '../model/timber/timber-part.ts';
import type { Size } from './size.ts';
import type { SawnOrientation } from './orientation.ts';

// One kind of part the specification implies, before allowances: what the
// cut list makes into a row. Lengths in mm.

export interface PartDemand {
  part: string;
  quantity: number;
  species: string;
  grade: Grade;
  finished: Size;
  /** Finished volume of one piece, mm^3 (the mass model's geometry), and how it was found. */
  volume_mm3: number;
  volumeBasis: string;
  /** The net blank the allowances are added to: the finished size, or for a curved part the straight piece it comes from. */
  blank: Size;
  blankBasis?: string;
  steamBent: boolean;
  /** Turned parts: both cross dimensions take the tangential shrinkage. */
  round: boolean;
  orientation?: SawnOrientation;
  /** Said of the grain beyond the grade, e.g. "grain along the chord". */
  grainNote?: string;
}

export const fmt = (v: number, d = 1) => Number(v.toFixed(d)).toString();

/** A prism's size and volume. */
export function prism(length: number, width: number, thickness: number): { size: Size; volume: number } {
  return { size: { length_mm: length, width_mm: width, thickness_mm: thickness }, volume: length * width * thickness };
}
