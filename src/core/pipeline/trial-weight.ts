import { RIDE_CASES } from '../ride/ride-types.ts';
import type { ModelId } from './model-values.ts';

// What a partial re-run costs, in units of one that reaches no ride case: the
// measure of the work limits of the decisive-input search and of `size`, so a
// search stops after the same work on any machine. A re-run of all five ride
// cases counts ten (about ten times a statics re-run, measured), one that
// reaches only some of them its share, and one that reaches the floor-damping
// tuner (many ride runs) forty.

export const TRIAL_WEIGHT = { plain: 1, ride: 10, tuner: 40 } as const;

/** The ride model's parts and the cases each runs (models.ts). */
const RIDE_PARTS: readonly [ModelId, number][] = [
  ['rideRough', 2],
  ['rideStone', 2],
  ['rideDrop', 1],
];

/** A re-run's weight from the models it makes stale. */
export function trialWeight(stale: ReadonlySet<string>): number {
  if (stale.has('floorDampingNeeded')) return TRIAL_WEIGHT.tuner;
  const cases = RIDE_PARTS.reduce((n, [id, k]) => n + (stale.has(id) ? k : 0), 0);
  return cases ? (TRIAL_WEIGHT.ride * cases) / RIDE_CASES.length : TRIAL_WEIGHT.plain;
}
