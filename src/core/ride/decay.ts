// Cycles until a motion falls below a fraction of its first amplitude
// (mechanics note, section 8). The turning points of the motion (where its
// rate changes sign) are found step by step; from the largest one after the
// input has ended, the time at which the turning points fall below the
// fraction is interpolated on the logarithm of their size, and divided by the
// period measured from the turning points' spacing. For a linear single-degree
// system this gives ln(1/fraction)/δ exactly, δ the logarithmic decrement.

export interface TurningPoint {
  t: number;
  /** Displacement from the rest position at the turning point. */
  z: number;
}

/** Collects turning points from a stepped record of displacement z and rate v. */
export class TurningPoints {
  readonly points: TurningPoint[] = [];
  #t = NaN;
  #z = NaN;
  #v = NaN;
  add(t: number, z: number, v: number): void {
    const [t0, z0, v0] = [this.#t, this.#z, this.#v];
    [this.#t, this.#z, this.#v] = [t, z, v];
    if (!(v0 > 0 && v <= 0) && !(v0 < 0 && v >= 0)) return;
    // The rate's zero by linear interpolation; the displacement there from the cubic Hermite through both ends.
    const h = t - t0;
    const s = v0 / (v0 - v);
    const s2 = s * s, s3 = s2 * s;
    const z1 = (2 * s3 - 3 * s2 + 1) * z0 + (s3 - 2 * s2 + s) * h * v0 + (-2 * s3 + 3 * s2) * z + (s3 - s2) * h * v;
    this.points.push({ t: t0 + s * h, z: z1 });
  }
}

export interface Decay {
  /** Cycles from the first amplitude until the motion stays below the fraction; null if it never does in the record. */
  cycles: number | null;
  firstAmplitude: number;
  /** Period from the turning points, s (NaN when too few). */
  period: number;
}

export function decayCycles(points: readonly TurningPoint[], fraction: number, after = -Infinity): Decay {
  const list = points.filter((p) => p.t >= after);
  if (list.length < 2) return { cycles: null, firstAmplitude: list[0] ? Math.abs(list[0].z) : 0, period: NaN };
  let k0 = 0;
  list.forEach((p, i) => (Math.abs(p.z) > Math.abs(list[k0].z) ? (k0 = i) : 0));
  const A1 = Math.abs(list[k0].z);
  const target = fraction * A1;
  for (let k = k0 + 1; k < list.length; k++) {
    const a = Math.abs(list[k].z);
    if (a >= target) continue;
    const prev = Math.abs(list[k - 1].z);
    const s = prev > target && a > 0 ? Math.log(prev / target) / Math.log(prev / a) : 0;
    const tStar = list[k - 1].t + s * (list[k].t - list[k - 1].t);
    const period = (2 * (list[k].t - list[k0].t)) / (k - k0);
    return { cycles: (tStar - list[k0].t) / period, firstAmplitude: A1, period };
  }
  const n = list.length - 1 - k0;
  return { cycles: null, firstAmplitude: A1, period: n > 0 ? (2 * (list[list.length - 1].t - list[k0].t)) / n : NaN };
}
