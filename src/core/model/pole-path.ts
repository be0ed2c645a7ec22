// The pole's centre line in the side elevation: a straight run under the
// floor from rear_x to root_x, then a circular steam bend tangent to that run,
// then a straight tangent to the yoke point. Lengths in mm.

export interface Point {
  x: number;
  z: number;
}

export interface PolePath {
  /** Developed lengths of the three pieces. */
  runLength: number;
  arcLength: number;
  riseLength: number;
  /** Angle swept by the bend, radians (0 for a straight rise). */
  bendAngle: number;
  /** Where the bend ends and the straight rise begins. */
  tangentPoint: Point;
  /** Length-weighted centre of the whole centre line. */
  centroid: Point;
  totalLength: number;
}

export type PolePathResult = { ok: true; path: PolePath } | { ok: false; largestRadius: number };

/** Root at (rootX, zPole), yoke point at yoke; bendRadius undefined for a kinked straight rise. */
export function polePath(rearX: number, rootX: number, zPole: number, yoke: Point, bendRadius?: number): PolePathResult {
  const runLength = rootX - rearX;
  const runMid: Point = { x: (rearX + rootX) / 2, z: zPole };
  const rises = yoke.z >= zPole ? 1 : -1;
  const dxTotal = yoke.x - rootX;
  const dzTotal = Math.abs(yoke.z - zPole);
  let arcLength = 0;
  let bendAngle = 0;
  let arcCentroid: Point = { x: rootX, z: zPole };
  let tangent: Point = { x: rootX, z: zPole };
  if (bendRadius !== undefined) {
    const R = bendRadius;
    // Work with the bend upward; mirror z for a downward bend.
    const dx = dxTotal;
    const dz = dzTotal - R; // yoke relative to the bend centre
    const D = Math.hypot(dx, dz);
    if (D <= R) return { ok: false, largestRadius: largestFeasibleRadius(dxTotal, dzTotal) };
    // Tangent condition: dx*sin(phi) - dz*cos(phi) = R.
    bendAngle = Math.atan2(dz, dx) + Math.asin(R / D);
    arcLength = R * bendAngle;
    const mean = bendAngle > 0 ? { s: (1 - Math.cos(bendAngle)) / bendAngle, c: Math.sin(bendAngle) / bendAngle } : { s: 0, c: 1 };
    arcCentroid = { x: rootX + R * mean.s, z: zPole + rises * (R - R * mean.c) };
    tangent = { x: rootX + R * Math.sin(bendAngle), z: zPole + rises * (R - R * Math.cos(bendAngle)) };
  }
  const riseLength = Math.hypot(yoke.x - tangent.x, yoke.z - tangent.z);
  const riseMid: Point = { x: (yoke.x + tangent.x) / 2, z: (yoke.z + tangent.z) / 2 };
  const totalLength = runLength + arcLength + riseLength;
  const centroid: Point = {
    x: (runMid.x * runLength + arcCentroid.x * arcLength + riseMid.x * riseLength) / totalLength,
    z: (runMid.z * runLength + arcCentroid.z * arcLength + riseMid.z * riseLength) / totalLength,
  };
  return { ok: true, path: { runLength, arcLength, riseLength, bendAngle, tangentPoint: tangent, centroid, totalLength } };
}

// With the yoke at (dx, dz) from the root, a bend of radius R fits while the
// yoke lies outside its circle: dx^2 + (dz - R)^2 > R^2, i.e. R < (dx^2+dz^2)/(2 dz).
function largestFeasibleRadius(dx: number, dz: number): number {
  return dz > 0 ? (dx * dx + dz * dz) / (2 * dz) : Infinity;
}
