import { param } from '../data/param.ts';
import { formatPercent, formatQuantity } from '../format/number-format.ts';
import type { ModelView } from '../pipeline/define-model.ts';
import { figureOrReason, notApplicable, type FigureEntry } from '../result/figure.ts';
import type { DynamicFactor, GroundFactors } from './dynamic-factors.ts';
import { casesOver, type RideCase, type RideResult, type RoadGround } from './ride-types.ts';

// The ride model's named figures: for each ground (routine rough ground, the
// stone) the worst over its two road cases (both wheels, one wheel) for the
// crew, the wheels and the yoke; the drop test for the decay. A figure the
// run cannot give is left out with the reason: all of them where the ride
// model did not run, the decay where the motion does not settle in the run.

/** Figure names by ground: routine names as before, the stone's with a `_stone` suffix. */
const names = (g: RoadGround) => {
  const s = g === 'stone' ? '_stone' : '';
  return {
    rise: `ride_crew_rise_max${s}`,
    airborne: `ride_crew_airborne${s}`,
    floor: `ride_floor_dlf${s}`,
    wheel: g === 'stone' ? 'wheel_dynamic_factor_stone' : 'wheel_dynamic_factor_routine',
    yoke: `ride_yoke_force_min${s}`,
  };
};

export const RIDE_FIGURES: readonly string[] = [...Object.values(names('rough-ground')), ...Object.values(names('stone')), 'drop_decay_cycles'];

const NOT_RUN = "the ride model was not run (a statics-only run, or no crew aboard): the dynamic factors are the data's bounds";

/** A factor from the ride model, or null where the data's bound stands in. */
const fromRide = (f: DynamicFactor) => (f.from === null ? null : f.value);

function groundFigures(ride: Record<RideCase, RideResult>, g: RoadGround, f: GroundFactors): Record<string, FigureEntry> {
  const road = casesOver(g).map((c) => ride[c]);
  const crew = road.flatMap((r) => r.crew);
  const n = names(g);
  const stopped = road.find((r) => r.stopped)?.stopped;
  const unsolved = `the ride model gave no finite value (${stopped ?? 'the floor was not solved: see floor.convergence'})`;
  return {
    [n.rise]: figureOrReason(Math.max(...crew.map((c) => c.rise_mm)), 'mm', unsolved),
    [n.airborne]: figureOrReason(Math.max(...crew.map((c) => c.airborne_ms)), 'ms', unsolved),
    [n.floor]: figureOrReason(fromRide(f.crew), '1', unsolved),
    [n.wheel]: figureOrReason(fromRide(f.wheel), '1', unsolved),
    [n.yoke]: figureOrReason(Math.min(...road.map((r) => r.yokeForceMin_N)), 'N', unsolved),
  };
}

export function rideFigures(a: ModelView<'ride' | 'bumpFactors' | 'stoneFactors'>): Record<string, FigureEntry> {
  const ride = a.ride;
  if (!ride) return notApplicable(RIDE_FIGURES, NOT_RUN);
  const fraction = param(a.data, 'ride.inputs', 'decay_fraction').value;
  const duration = param(a.data, 'ride.inputs', 'duration_s').value;
  return {
    ...groundFigures(ride, 'rough-ground', a.bumpFactors),
    ...groundFigures(ride, 'stone', a.stoneFactors),
    drop_decay_cycles: figureOrReason(ride.drop.decayCycles, 'cycles', ride.drop.stopped ? `the drop test could not be run (${ride.drop.stopped})` : `after the drop test the crew's motion does not fall below ${formatPercent(fraction)} of its first amplitude within the ${formatQuantity(duration, 's')} run`),
  };
}
