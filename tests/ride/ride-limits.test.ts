// The ride model's limits: a case whose integration reaches the step limit,
// or whose floor stiffness is not known, is not run, and says why; the integrator stops at its step limit; a case not run meets no rule.
import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { buildRide } from '../../src/core/ride/ride-build.ts';
import { rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { MAX_RIDE_STEPS, runRide } from '../../src/core/ride/ride-run.ts';
import { integrate } from '../../src/core/ride/integrate.ts';
import { meetsRideRules } from '../../src/core/ride/ride-verdict.ts';
import { param } from '../../src/core/data/param.ts';
import { bisectLeast, MAX_BISECTIONS } from '../../src/core/ride/bisect-least.ts';

/** The demo with the driver's mass set past the schema (a model-level test: the schema refuses it at the door). */
function withDriverMass(kg: number): Analysis {
  const spec = prepared(readDemo('demo-two-crew'));
  spec.crew[0].mass_kg = kg;
  return new Analysis(spec, rulesData);
}

/** A case of the demo with a feather-light driver (a period of about 0.4 ms on the floor), run with at most `maxSteps` trial steps. */
function limited(which: 'rough-ridge' | 'drop', maxSteps: number) {
  const a = withDriverMass(1e-4);
  const built = buildRide(rideInput(a), which);
  const settings = { duration: param(rulesData, 'ride.inputs', 'duration_s').value, sampleInterval: 0.002, decayFraction: 0.1, title: which, maxSteps };
  return { built, r: runRide(built, which, settings) };
}

describe('a ride case the integrator cannot carry', () => {
  it('is not run when the integration reaches its step limit, and says where', () => {
    const { built, r } = limited('rough-ridge', 2000);
    const driver = built.system.crew[0];
    // The driver on the floor is a mass on a spring: T = 2π√(m/k), far below the rest of the model's periods.
    const T = 2 * Math.PI * Math.sqrt(driver.m / driver.k);
    expect(T).toBeLessThan(1e-3);
    expect(r.stopped).toMatch(/the integration stopped at \d\.\d{3} s of 3\.000 s after 2000 trial steps/);
    expect(r.steps).toBe(0);
    expect(Number.isNaN(r.crew[0].floor_dlf)).toBe(true);
    expect(r.method).toMatch(/^not run: /);
    expect(r.working.join('\n')).not.toMatch(/\bNaN\b|\bInfinity\b/);
  });

  it('runs the same build with a real driver', () => {
    const r = rideCaseOf(rideInput(withDriverMass(78)), 'rough-ridge');
    expect(r.stopped).toBeUndefined();
    expect(r.steps).toBeGreaterThan(0);
    expect(r.steps).toBeLessThan(MAX_RIDE_STEPS);
  });

  it('is not run where the floor under a crew member is not known, naming them', () => {
    const a = withDriverMass(78);
    const input = rideInput(a);
    const floor = { ...input.floorStatic, crew: input.floorStatic.crew.map((c, i) => (i === 0 ? { ...c, tangentStiffness_N_per_mm: NaN } : c)) };
    const r = rideCaseOf({ ...input, floorStatic: floor }, 'drop');
    expect(r.stopped).toMatch(/under driver is not known/);
    expect(r.working.join('\n')).not.toMatch(/\bNaN\b/);
  });

  it('meets no ride rule when a case was not run', () => {
    const { r } = limited('drop', 200);
    expect(meetsRideRules({ drop: r }, { airborne_ms: 1e9, rise_mm: 1e9 }, 1e9)).toBe(false);
  });
});

describe('the integrator', () => {
  it('stops at its step limit and says where', () => {
    const y0 = Float64Array.of(1, 0);
    const stats = integrate((_t, y, dy) => { dy[0] = y[1]; dy[1] = -y[0]; }, () => 0, y0, 0, 100, { rtol: 1e-10, atol: 1e-13, h0: 0.01, eventTolerance: 1e-9, maxSteps: 10, onStep() {} });
    expect(stats.steps + stats.rejected).toBe(10);
    expect(stats.t).toBeLessThan(100);
    expect(stats.stopped).toMatch(new RegExp(`stopped at ${stats.t.toFixed(3)} s of 100\\.000 s after 10 trial steps`));
  });
});

describe('the bisection', () => {
  it('stops after its halvings even with no tolerance, on a value that holds', () => {
    // Holds from 0.3 upwards; with a tolerance of 0 only the halving limit stops it.
    const r = bisectLeast((x) => x >= 0.3, 0, 1, 0);
    expect(r.evaluations).toBe(2 + MAX_BISECTIONS);
    expect(r.value).toBeGreaterThanOrEqual(0.3);
    expect(r.value! - 0.3).toBeLessThan(1e-15);
  });
});
