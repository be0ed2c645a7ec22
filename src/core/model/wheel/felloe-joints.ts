// Where the felloe's joints fall. A felloe in `pieces` lengths has as many
// joints, evenly spaced; the first is put midway between two spokes, as a
// wheelwright places them (a sawn felloe carries two spokes a segment and a
// bent half-rim half the spokes, the joints falling between spokes: shop
// practice, rules/sources.yaml `wheelwright-felloe-shop`). Angles in the
// wheel's own frame: spoke k at 2πk/n, counter-clockwise.

export interface FelloeJoints {
  /** Every joint's angle, rad. */
  angles: number[];
  /**
   * The joints that stand for all the others: turning the wheel by the angle
   * between two joints maps spokes onto spokes only every `pieces / gcd(n, pieces)`
   * joints, so those first few are all that differ.
   */
  representatives: number[];
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

export function felloeJoints(spokes: number, pieces: number): FelloeJoints {
  const angles = Array.from({ length: pieces }, (_, j) => Math.PI / spokes + (2 * Math.PI * j) / pieces);
  const distinct = pieces / gcd(spokes, pieces);
  return { angles, representatives: angles.slice(0, distinct) };
}
