import { buildRide, type RideInput, type RideOptions } from './ride-build.ts';
import { rideParam } from './ride-data.ts';
import { rideTitle, runRide, type RunSettings } from './ride-run.ts';
import { RIDE_CASES, type RideCase, type RideResult } from './ride-types.ts';
export { RIDE_CASES } from './ride-types.ts';

// Entry points of the ride model: one case, or all of them.

/** How a case is run: the rules data's duration, sampling and decay fraction, and the options' tolerance and early end. */
export function runSettings(i: RideInput, which: RideCase, o: RideOptions = {}): RunSettings {
  return {
    duration: o.duration ?? rideParam(i.data, 'ride.inputs', 'duration_s').value,
    sampleInterval: rideParam(i.data, 'ride.inputs', 'sample_interval_s').value,
    decayFraction: rideParam(i.data, 'ride.inputs', 'decay_fraction').value,
    title: rideTitle(which),
    ...(o.tolerance !== undefined ? { tolerance: o.tolerance } : {}),
    ...(o.enough ? { enough: o.enough } : {}),
    ...(o.series === false ? { series: false } : {}),
    ...(o.plotPoints ? { plotPoints: o.plotPoints } : {}),
  };
}

export function rideCaseOf(i: RideInput, which: RideCase, o: RideOptions = {}): RideResult {
  return runRide(buildRide(i, which, o), which, runSettings(i, which, o));
}

export function rideCases(i: RideInput, o: RideOptions = {}): Record<RideCase, RideResult> {
  return someRideCases(i, RIDE_CASES, o) as Record<RideCase, RideResult>;
}

/** The named cases only, in the order given. */
export function someRideCases(i: RideInput, cases: readonly RideCase[], o: RideOptions = {}): Partial<Record<RideCase, RideResult>> {
  return Object.fromEntries(cases.map((c) => [c, rideCaseOf(i, c, o)]));
}
