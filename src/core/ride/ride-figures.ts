import type { Analysis } from '../engine/analysis.ts';
import type { Figure } from '../result/figure.ts';
import { ROAD_CASES } from './ride-verdict.ts';

// The ride model's named figures: the worst over the two road cases (ridge,
// one wheel) for the crew, wheels and yoke; the drop test for the decay.
// decay cycles NaN where the motion does not fall below 10 % in the run;
// floor damping needed NaN where no ratio up to 1 meets the ride rules.
export function rideFigures(a: Analysis): Record<string, Figure> {
  if (!a.hasRide) return {};
  const road = ROAD_CASES.map((c) => a.ride[c]);
  const crew = road.flatMap((r) => r.crew);
  const need = a.graph.peek('floorDampingNeeded');
  return {
    ride_crew_rise_max: { value: Math.max(...crew.map((c) => c.rise_mm)), unit: 'mm' },
    ride_crew_airborne: { value: Math.max(...crew.map((c) => c.airborne_ms)), unit: 'ms' },
    ride_floor_dlf: { value: a.bumpFactors.crew.value, unit: '1' },
    ride_wheel_dlf: { value: a.bumpFactors.wheel.value, unit: '1' },
    ride_yoke_force_min: { value: Math.min(...road.map((r) => r.yokeForceMin_N)), unit: 'N' },
    drop_decay_cycles: { value: a.ride.drop.decayCycles ?? NaN, unit: 'cycles' },
    ...(need ? { floor_damping_ratio_needed: { value: need.ratio ?? NaN, unit: '1' } } : {}),
  };
}
