// Which shrinkage figure, radial or tangential, a part's width and thickness
// take when it is cut green (mechanics note, section 9). Flat-sawn: the width
// face lies along the growth rings (tangential), the thickness across them
// (radial); quarter-sawn the other way round. Unknown, and turned parts whose
// cross-section holds both directions: tangential, the larger, both ways.

export type SawnOrientation = 'flat-sawn' | 'quarter-sawn';
export type ShrinkDirection = 'radial' | 'tangential';

export function shrinkDirections(orientation: SawnOrientation | undefined, round: boolean): { width: ShrinkDirection; thickness: ShrinkDirection; why: string } {
  if (round) return { width: 'tangential', thickness: 'tangential', why: 'turned part: tangential, the larger figure, across both' };
  if (orientation === 'flat-sawn') return { width: 'tangential', thickness: 'radial', why: 'flat-sawn: width tangential, thickness radial' };
  if (orientation === 'quarter-sawn') return { width: 'radial', thickness: 'tangential', why: 'quarter-sawn: width radial, thickness tangential' };
  return { width: 'tangential', thickness: 'tangential', why: 'orientation not given: tangential, the larger figure, both ways' };
}
