// The law of every one-sided contact of the ride model (wheel on the ground,
// crew on the floor, the prop of the drop test): Hunt and Crossley's
// (hunt-crossley-1975) damping proportional to the indentation, on a linear
// spring,
//   F = k·x + λ·x·x'   while x > 0, never below zero; 0 while x ≤ 0,
// with λ = c / x_s, so that about the standing compression x_s the damping is
// the data's c = 2ζ√(k·m). The force starts from zero at first touch (no jump
// c·x' as a spring and damper in parallel gives) and the contact never pulls:
// where a fast rebound would make it negative it is cut at zero, the surfaces
// parting before the gap opens (design basis, section 8).

/** The contact force of indentation x (m) and its rate v (m/s); k in N/m, c in N·s/m at the standing compression xs (m). */
export function contactForce(k: number, c: number, xs: number, x: number, v: number): number {
  if (x <= 0) return 0;
  const F = x * (k + (c / xs) * v);
  return F > 0 ? F : 0;
}

/** The damping coefficient at indentation x, N·s/m: λ·x = c·x/x_s (zero at first touch). */
export function contactDamping(c: number, xs: number, x: number): number {
  return x > 0 ? (c * x) / xs : 0;
}
