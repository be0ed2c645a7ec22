import { illinois } from './illinois.ts';
import type { DenseOutput } from './integrate.ts';

// Cycles until a motion falls below a fraction of its first amplitude
// (mechanics note, section 8). The turning points of the motion (where its
// rate changes sign) are found step by step on the integrator's dense output; from the largest one after the
// input has ended, the time at which the turning points fall below the
// fraction is interpolated on the logarithm of their size, and divided by the
// period measured from the turning points' spacing. For a linear single-degree
// system this gives ln(1/fraction)/δ exactly, δ the logarithmic decrement.

export interface TurningPoint {
  t: number;
  /** Displacement from the rest position at the turning point. */
  z: number;
}

/** Ends a run early once it returns true, given each crew member's turning points so far and the time of the first wheel contact. */
export type Enough = (turning: readonly (readonly TurningPoint[])[], firstContact: number) => boolean;

/** Collects turning points from the accepted steps of a run, located on each step's dense output. */
export class TurningPoints {
  readonly points: TurningPoint[] = [];
  /** The rest position the displacement is measured from, and the state indices of the displacement and its rate. */
  constructor(readonly rest: number, readonly zIndex: number, readonly vIndex: number) {}
  /** One accepted step from t0 to t1, the rate v0 at its start and v1 at its end; the rate's zero by Illinois, the displacement there from the same dense output. */
  step(t0: number, t1: number, v0: number, v1: number, dense: DenseOutput): void {
    if (!(v0 > 0 && v1 <= 0) && !(v0 < 0 && v1 >= 0)) return;
    const t = illinois((x) => dense.value(this.vIndex, x), t0, t1, v0, v1, 1e-9 * Math.max(1, t1));
    this.points.push({ t, z: dense.value(this.zIndex, t) - this.rest });
  }
}

export interface Decay {
  /** Cycles from the first amplitude until the motion stays below the fraction; null if it never does in the record. */
  cycles: number | null;
  firstAmplitude: number;
  /** Period from the turning points, s (NaN when too few). */
  period: number;
}

/** The largest turning point at or after `after`, and the turning points from there on. */
export function fromLargest(points: readonly TurningPoint[], after: number): readonly TurningPoint[] {
  const list = points.filter((p) => p.t >= after);
  let k0 = 0;
  list.forEach((p, k) => (Math.abs(p.z) > Math.abs(list[k0].z) ? (k0 = k) : 0));
  return list.slice(k0);
}

export function decayCycles(points: readonly TurningPoint[], fraction: number, after = -Infinity): Decay {
  const list = fromLargest(points, after);
  const A1 = list.length ? Math.abs(list[0].z) : 0;
  if (list.length < 2) return { cycles: null, firstAmplitude: A1, period: NaN };
  const target = fraction * A1;
  for (let k = 1; k < list.length; k++) {
    const a = Math.abs(list[k].z);
    if (a >= target) continue;
    const prev = Math.abs(list[k - 1].z);
    const s = prev > target && a > 0 ? Math.log(prev / target) / Math.log(prev / a) : 0;
    const tStar = list[k - 1].t + s * (list[k].t - list[k - 1].t);
    const period = (2 * (list[k].t - list[0].t)) / k;
    return { cycles: (tStar - list[0].t) / period, firstAmplitude: A1, period };
  }
  const n = list.length - 1;
  return { cycles: null, firstAmplitude: A1, period: (2 * (list[n].t - list[0].t)) / n };
}
