import type { ModelView } from '../pipeline/define-model.ts';
import type { Figure } from '../result/figure.ts';
import { ROAD_CASES } from './ride-verdict.ts';

// The ride model's named figures: the worst over the two road cases (ridge,
// one wheel) for the crew, wheels and yoke; the drop test for the decay.
// None where the ride model did not run; decay cycles NaN where the motion
// does not fall below 10 % in the run.
export function rideFigures(a: ModelView<'ride' | 'bumpFactors'>): Record<string, Figure> {
  const ride = a.ride;
  if (!ride) return {};
  const road = ROAD_CASES.map((c) => ride[c]);
  const crew = road.flatMap((r) => r.crew);
  return {
    ride_crew_rise_max: { value: Math.max(...crew.map((c) => c.rise_mm)), unit: 'mm' },
    ride_crew_airborne: { value: Math.max(...crew.map((c) => c.airborne_ms)), unit: 'ms' },
    ride_floor_dlf: { value: a.bumpFactors.crew.value, unit: '1' },
    ride_wheel_dlf: { value: a.bumpFactors.wheel.value, unit: '1' },
    ride_yoke_force_min: { value: Math.min(...road.map((r) => r.yokeForceMin_N)), unit: 'N' },
    drop_decay_cycles: { value: ride.drop.decayCycles ?? NaN, unit: 'cycles' },
  };
}
