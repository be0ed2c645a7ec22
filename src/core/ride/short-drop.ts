import { decayCycles, fromLargest, type TurningPoint } from './decay.ts';
import { decayShortfall, turningPointsNeeded } from './decay-shortfall.ts';
import type { RideInput } from './ride-build.ts';
import { rideCaseOf } from './ride-model.ts';

// A short drop run for the floor-damping tuner: the drop test at a floor
// damping ratio, ended as soon as every crew member's turning points reach
// the ones the decay's shortfall reads (decay-shortfall.ts: ⌊2M⌋ + 1 half
// cycles past the largest), with the decay rule's own verdict on the same
// turning points beside it. The tuner searches on the shortfall (continuous in
// the damping); the verdict checks that the two agree.

export interface ShortDrop {
  /** The slowest crew member's shortfall: at most zero where the decay holds; Infinity where the run could not be made or the motion does not turn. */
  shortfall: number;
  /** The decay rule's verdict on the same turning points: every crew member within the cycles allowed. */
  holds: boolean;
}

export function shortDrop(i: RideInput, zeta: number, fraction: number, maxCycles: number): ShortDrop {
  let seen: readonly (readonly TurningPoint[])[] = [];
  let after = Infinity;
  const r = rideCaseOf(i, 'drop', {
    floorDampingRatio: zeta,
    enough(turning, firstContact) {
      [seen, after] = [turning, Number.isNaN(firstContact) ? Infinity : firstContact];
      return turning.every((pts) => fromLargest(pts, after).length > turningPointsNeeded(maxCycles));
    },
  });
  if (r.stopped) return { shortfall: Infinity, holds: false };
  const each = seen.map((pts) => decayShortfall(pts, fraction, maxCycles, after));
  const holds = seen.every((pts) => {
    const c = decayCycles(pts, fraction, after).cycles;
    return c !== null && c <= maxCycles;
  });
  return { shortfall: each.some(Number.isNaN) ? Infinity : Math.max(...each), holds };
}
