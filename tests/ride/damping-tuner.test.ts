import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { crewLimits, DAMPING_GRID, floorDampingNeeded, ratioOfDecrement } from '../../src/core/ride/damping-tuner.ts';
import { leastOnGrid } from '../../src/core/ride/bisect-least.ts';
import { rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { meetsRideRules } from '../../src/core/ride/ride-verdict.ts';
import { limitLevel } from '../../src/core/data/param.ts';
import type { RideInput } from '../../src/core/ride/ride-build.ts';
import type { RideCase, RideResult } from '../../src/core/ride/ride-types.ts';

// The floor-damping tuner (secant on the decrement over short drop runs,
// confirmed by full runs) against the brute force it replaced: the rising
// grid of full simulations of the drop and both rough-ground cases, then
// bisection on full simulations to the same tolerance.

function bruteForce(i: RideInput, tolerance: number): { value: number | null; runs: number } {
  const limits = crewLimits(i.data);
  const maxCycles = limitLevel(i.data, 'ride.decay', 'cycles', 'hard');
  let runs = 0;
  const holds = (zeta: number) => {
    const rides: Partial<Record<RideCase, RideResult>> = {};
    for (const c of ['drop', 'rough-ridge', 'rough-one-wheel'] as RideCase[]) {
      rides[c] = rideCaseOf(i, c, { floorDampingRatio: zeta });
      runs++;
      if (!meetsRideRules(rides, limits, maxCycles)) return false;
    }
    return true;
  };
  return { value: leastOnGrid(holds, DAMPING_GRID, tolerance).value, runs };
}

const validation = (name: string) => parse(readFileSync(new URL(`../../specs/validation/${name}.yaml`, import.meta.url), 'utf8'));

describe('the floor-damping tuner', () => {
  /** The demo on a rougher ridge (35 mm in 600 mm, demo data), where the crew leave the floor at the decay's ratio and the crew rule decides. */
  const rougher = () => ({ ...readDemo('demo-two-crew'), operation: { ...(readDemo('demo-two-crew').operation as object), rough_ground: { height_mm: 35, length_mm: 600 } } });
  const cases: [string, () => unknown][] = [
    ['demo-two-crew', () => readDemo('demo-two-crew')],
    ['demo-two-crew on a rougher ridge', rougher],
    ['demo-rear-axle', () => readDemo('demo-rear-axle')],
    // The validation specs whose decay is slow, where the check runs the tuner.
    ['wetwang-two-pony', () => validation('wetwang-two-pony')],
    ['trade-two-pony', () => validation('trade-two-pony')],
  ];
  for (const [name, raw] of cases) {
    it(`agrees with the brute-force bisection on full runs to its tolerance: ${name}`, () => {
      const i = rideInput(new Analysis(prepared(raw()), rulesData));
      const need = floorDampingNeeded(i);
      const ref = bruteForce(i, need.tolerance).value;
      expect(need.ratio).not.toBeNull();
      expect(ref).not.toBeNull();
      // Both are the least ratio to 0.5 %: within a tolerance of each other (the bisection's own width).
      expect(Math.abs(need.ratio! - ref!) / ref!, need.working).toBeLessThanOrEqual(need.tolerance);
      expect(need.simulations).toBe(need.shortRuns + Number(need.working.match(/(\d+) full runs/)![1]));
    });
  }

  for (const demo of ['demo-two-crew', 'demo-rear-axle']) {
    it(`finds the decay of ${demo} in at most three short drop runs, confirmed by one full run of each case`, () => {
      const need = floorDampingNeeded(rideInput(new Analysis(prepared(readDemo(demo)), rulesData)));
      expect(need.shortRuns).toBeLessThanOrEqual(3);
      expect(need.working).toMatch(/confirmed by full runs/);
      expect(need.working).toContain('3 full runs');
    });
  }

  it('where the crew leave the floor at the decay\'s ratio, searches the crew rule on the rough-ground case alone', () => {
    const i = rideInput(new Analysis(prepared(rougher()), rulesData));
    const need = floorDampingNeeded(i);
    expect(need.working).toMatch(/crew leave the floor over rough-ridge: secant on their excess/);
    expect(need.simulations).toBeLessThanOrEqual(bruteForce(i, need.tolerance).runs / 2);
  });

  it('starts from the single-degree ratio of the logarithmic decrement', () => {
    // Thomson and Dahleh, Theory of Vibration with Applications, section 2.6 (log decrement):
    // δ = 2πζ/√(1 − ζ²), so ζ = δ/√(4π² + δ²); for three cycles to 10 %, δ = ln(10)/3 = 0.76753, ζ = 0.1213.
    for (const zeta of [0.01, 0.1213, 0.3, 0.7]) {
      const delta = (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
      expect(ratioOfDecrement(delta)).toBeCloseTo(zeta, 12);
    }
    expect(ratioOfDecrement(Math.log(10) / 3)).toBeCloseTo(0.1213, 4);
  });
});
