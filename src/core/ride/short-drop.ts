import { decayCycles, type TurningPoint } from './decay.ts';
import type { RideInput } from './ride-build.ts';
import { rideCaseOf } from './ride-model.ts';

// A short drop run for the floor-damping tuner: the drop test at a floor
// damping ratio, ended as soon as the crew's decay is decided, and its
// effective logarithmic decrement ln(1/f)/N, N the cycles to fall below the
// fraction f of the first amplitude (decay.ts). Decided means every crew
// member's turning points have fallen below the fraction (N is then what the
// full run gives, unless a later turning point rose above the first
// amplitude, which a dying motion does not do: the tuner's full confirmation
// run checks it), or have gone on for a cycle past the rule's allowance
// without (N is then estimated from the mean decrement between the largest
// turning point and the last: ln(1/f) over it per cycle).

/** Turning points past the largest, as half cycles, after which a motion that has not fallen below the fraction is given up on. */
const halfCycles = (maxCycles: number) => 2 * (maxCycles + 1);

/** The turning points after a time, and the index of the largest among them. */
function fromLargest(points: readonly TurningPoint[], after: number): { list: TurningPoint[]; k0: number } {
  const list = points.filter((p) => p.t >= after);
  let k0 = 0;
  list.forEach((p, k) => (Math.abs(p.z) > Math.abs(list[k0].z) ? (k0 = k) : 0));
  return { list, k0 };
}

/** The cycles to the fraction, or the estimate from the mean decrement where the points have not reached it. */
function cyclesOf(points: readonly TurningPoint[], fraction: number, after: number): number {
  const d = decayCycles(points, fraction, after);
  if (d.cycles !== null) return d.cycles;
  const { list, k0 } = fromLargest(points, after);
  const last = list.length - 1;
  if (last <= k0) return Infinity;
  const perCycle = (2 * Math.log(Math.abs(list[k0].z) / Math.abs(list[last].z))) / (last - k0);
  return perCycle > 0 ? Math.log(1 / fraction) / perCycle : Infinity;
}

/** The effective decrement ln(1/f)/N of the slowest crew member after the drop at floor damping ratio zeta (0 where the motion does not die out). */
export function shortDropDecrement(i: RideInput, zeta: number, fraction: number, maxCycles: number): number {
  let seen: readonly (readonly TurningPoint[])[] = [];
  let after = Infinity;
  const r = rideCaseOf(i, 'drop', {
    floorDampingRatio: zeta,
    enough(turning, firstContact) {
      [seen, after] = [turning, Number.isNaN(firstContact) ? Infinity : firstContact];
      return turning.every((pts) => {
        if (decayCycles(pts, fraction, after).cycles !== null) return true;
        const { list, k0 } = fromLargest(pts, after);
        return list.length - 1 - k0 >= halfCycles(maxCycles);
      });
    },
  });
  if (r.stopped) return 0;
  const cycles = Math.max(...seen.map((pts) => cyclesOf(pts, fraction, after)));
  return Number.isFinite(cycles) && cycles > 0 ? Math.log(1 / fraction) / cycles : 0;
}
