// The nodes of a ring of straight elements: every angle the model must hold
// as a node (spokes, the load, the edges of a joint's zone), and between
// consecutive ones equal elements no longer than a given angle. Angles in
// radians, measured from the ground contact, counter-clockwise, in [0, 2π).

const TWO_PI = 2 * Math.PI;

/** An angle brought into [0, 2π). */
export function wrapAngle(a: number): number {
  const w = a % TWO_PI;
  return w < 0 ? w + TWO_PI : w;
}

/** How far apart two angles are round the ring, the shorter way: 0 to π. */
export function angleApart(a: number, b: number): number {
  return Math.abs(wrapAngle(a - b + Math.PI) - Math.PI);
}

/** Angles closer than this are one node (radians; far below any element). */
const SAME = 1e-9;

/** Whether two angles (any turns apart) name the same point of the ring. */
export function sameAngle(a: number, b: number): boolean {
  const d = wrapAngle(a - b);
  return d < SAME || TWO_PI - d < SAME;
}

/** The node angles, ascending: every key angle, and equal subdivisions of at most `maxStep` between them. */
export function ringNodes(keys: readonly number[], maxStep: number): number[] {
  if (!(maxStep > 0)) throw new Error('the ring mesh needs a positive element angle');
  const sorted = keys.map(wrapAngle).sort((a, b) => a - b);
  const unique = sorted.filter((a, i) => i === 0 || a - sorted[i - 1] > SAME);
  if (unique.length > 1 && TWO_PI - unique[unique.length - 1] + unique[0] <= SAME) unique.pop();
  if (unique.length === 0) unique.push(0);
  const out: number[] = [];
  unique.forEach((a, i) => {
    const next = i + 1 < unique.length ? unique[i + 1] : unique[0] + TWO_PI;
    const parts = Math.max(1, Math.ceil((next - a) / maxStep - 1e-9));
    for (let p = 0; p < parts; p++) out.push(a + ((next - a) * p) / parts);
  });
  return out.map(wrapAngle).sort((a, b) => a - b);
}

/** The index of the node at an angle; throws where the mesh has none there. */
export function nodeAt(nodes: readonly number[], angle: number): number {
  const i = nodes.findIndex((a) => sameAngle(a, angle));
  if (i < 0) throw new Error(`the ring mesh has no node at ${angle} rad`);
  return i;
}

/** A mesh's node angles seen from a frame turned by `by` (each angle plus `by`), ascending in [0, 2π). */
export function turnedMesh(nodes: readonly number[], by: number): number[] {
  return nodes.map((a) => {
    const w = wrapAngle(a + by);
    return TWO_PI - w < SAME ? 0 : w;
  }).sort((a, b) => a - b);
}

/** Whether two ascending meshes hold the same nodes. */
export function sameMesh(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => Math.abs(x - b[i]) < SAME);
}
