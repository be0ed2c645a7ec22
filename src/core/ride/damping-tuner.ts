import { limitLevel } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import { leastOnGrid } from './bisect-least.ts';
import type { RideInput } from './ride-build.ts';
import { rideCaseOf } from './ride-model.ts';
import { ROUTINE_CASES, type RideCase, type RideResult } from './ride-types.ts';
import { meetsRideRules, type CrewLimits } from './ride-verdict.ts';

// The floor-damping tuner: the least floor damping ratio with which the crew
// stay on the floor over routine rough ground and their motion dies out within the
// decay rule's cycles, found by bisection over full simulations of the drop test
// and the two rough-ground cases (design basis, section 8).

export interface DampingNeeded {
  /** The least floor damping ratio that meets both rules; null if none up to the upper bound does. */
  ratio: number | null;
  /** The rising grid walked before the bisection, and the relative tolerance. */
  grid: readonly number[];
  tolerance: number;
  /** True when even the lower bound meets them (any damping does). */
  atLower: boolean;
  simulations: number;
  working: string;
}

/** The crew rule's hard levels: beyond them the rule fails, so the tuner must keep within them. */
export const crewLimits = (data: RulesData): CrewLimits => ({
  airborne_ms: limitLevel(data, 'ride.crew-airborne', 'airborne_ms', 'hard'),
  rise_mm: limitLevel(data, 'ride.crew-airborne', 'rise_mm', 'hard'),
});

/** Floor damping ratios tried in turn before bisecting between the last that fails and the first that holds. */
export const DAMPING_GRID: readonly number[] = [0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.45, 0.7, 1];

export function floorDampingNeeded(i: RideInput, grid: readonly number[] = DAMPING_GRID, tolerance = 5e-3): DampingNeeded {
  const limits = crewLimits(i.data);
  const maxCycles = limitLevel(i.data, 'ride.decay', 'cycles', 'hard');
  let simulations = 0;
  // The drop first: the decay most often decides, and a failing case ends the trial.
  const order: RideCase[] = ['drop', ...ROUTINE_CASES];
  const holds = (zeta: number) => {
    const rides: Partial<Record<RideCase, RideResult>> = {};
    for (const c of order) {
      rides[c] = rideCaseOf(i, c, { floorDampingRatio: zeta });
      simulations++;
      if (!meetsRideRules(rides, limits, maxCycles)) return false;
    }
    return true;
  };
  const r = leastOnGrid(holds, grid, tolerance);
  const [lower, upper] = [grid[0], grid[grid.length - 1]];
  const working = r.value === null
    ? `no floor damping ratio up to ${upper} keeps the crew on the floor over rough ground and their motion within ${maxCycles} cycles (${simulations} simulations)`
    : r.atLower
      ? `the rules are met already at a floor damping ratio of ${lower}`
      : `ζ_floor tried at ${grid.join(', ')} in turn, then bisection to ${tolerance * 100} %: least ζ_floor = ${r.value.toFixed(4)} (${simulations} simulations)`;
  return { ratio: r.value, grid, tolerance, atLower: r.atLower, simulations, working };
}
