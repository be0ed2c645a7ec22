import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { contactDamping, contactForce } from '../../src/core/ride/contact-law.ts';
import { buildRide } from '../../src/core/ride/ride-build.ts';
import { rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { integrate } from '../../src/core/ride/integrate.ts';
import { contactMode, crewShut, derivative, newForces, stateSize } from '../../src/core/ride/ride-system.ts';
import type { RideCase } from '../../src/core/ride/ride-types.ts';
import { staticEquilibrium } from '../../src/core/ride/static-equilibrium.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// The contact law of the ride model: Hunt and Crossley's damping proportional
// to the indentation on a linear spring, F = k·x + (c/x_s)·x·x' (hunt-crossley-1975,
// n = 1), never pulling. A spring and damper in parallel jumps to c·x' at first
// touch; this law starts from zero.

const k = 20_000, m = 75, g = 9.80665; // a person on a floor (demo data)
const xs = (m * g) / k;
const c = 2 * 0.2 * Math.sqrt(k * m);

describe('the contact law', () => {
  it('gives no force at first touch, whatever the closing speed, and grows from zero', () => {
    for (const v of [0.1, 1, 3, 10]) {
      expect(contactForce(k, c, xs, 0, v)).toBe(0);
      // Within a micrometre of touching the force is a hair, where the parallel law gives c·v at once.
      expect(contactForce(k, c, xs, 1e-6, v)).toBeLessThan(1e-3 * c * v);
    }
    expect(contactForce(k, c, xs, -0.001, 5)).toBe(0);
  });

  it('damps as the data\'s c at the standing compression, c = 2ζ√(km)', () => {
    // At x = x_s the law is k·x_s + c·v, the linear spring and damper the damping ratio is defined on.
    expect(contactForce(k, c, xs, xs, 0.2)).toBeCloseTo(k * xs + c * 0.2, 9);
    expect(contactDamping(c, xs, xs)).toBeCloseTo(c, 12);
    expect(contactDamping(c, xs, xs / 2)).toBeCloseTo(c / 2, 12);
  });

  it('never pulls: a fast rebound cuts the force at zero', () => {
    // F = x(k + c·v/x_s) < 0 for v < −k·x_s/c; cut there.
    const vCut = (-k * xs) / c;
    expect(contactForce(k, c, xs, xs, vCut * 1.01)).toBe(0);
    expect(contactForce(k, c, xs, xs, vCut * 0.99)).toBeGreaterThan(0);
  });
});

const analysis = (name: string) => new Analysis(prepared(readDemo(name)), rulesData);

/** One case run with the model's own equations and read at each step's end and on its dense output every h between: the first crew member's and the left wheel's force and indentation at each reading. */
function record(name: string, which: RideCase, h = 2e-4, duration = 1.5) {
  const b = buildRide(rideInput(analysis(name)), which);
  const sys = b.system;
  const rest = staticEquilibrium(sys);
  const y0 = Float64Array.from(rest.y);
  const N = 3 + sys.crew.length;
  if (b.drop > 0) for (let i = 0; i < N; i++) if (i !== 1 && i !== 2) y0[i] += b.drop;
  const f = newForces(sys), scratch = newForces(sys), dy = new Float64Array(stateSize(sys)), probe = new Float64Array(stateSize(sys));
  const steps: { t0: number; t1: number; crewF: number; crewX: number; crewV: number; wheelF: number; wheelX: number }[] = [];
  let next = h, last = 0;
  const read = (t: number, y: Float64Array) => {
    derivative(sys, t, y, dy, f);
    steps.push({ t0: last, t1: t, crewF: f.crew[0], crewX: f.crewIndent[0], crewV: y[N] - y[N + 3], wheelF: f.wheel[0], wheelX: f.wheelIndent[0] });
    last = t;
  };
  integrate((t, y, d) => derivative(sys, t, y, d), (t, y) => contactMode(sys, t, y, scratch), y0, 0, duration, {
    rtol: 1e-8,
    atol: 1e-11,
    h0: h,
    eventTolerance: 1e-9,
    breaks: b.breaks,
    onStep(_t0, t1, y, _m, dense) {
      for (; next < t1 - 1e-12; next += h) {
        dense.at(next, probe);
        read(next, probe);
      }
      // and each step's end: a contact event ends a step just past the touch
      read(t1, y);
      if (next <= t1 + 1e-12) next += h;
    },
  });
  return { sys, steps };
}

/** The steps from the first after a landing (indentation rising through zero) to the peak force that follows. */
function landing(steps: ReturnType<typeof record>['steps'], x: 'crewX' | 'wheelX', F: 'crewF' | 'wheelF') {
  const first = steps.findIndex((s, i) => i > 0 && steps[i - 1][x] <= 0 && s[x] > 0);
  expect(first).toBeGreaterThan(0);
  let peak = first;
  while (peak + 1 < steps.length && steps[peak + 1][F] >= steps[peak][F]) peak++;
  return steps.slice(first, peak + 1).map((s) => s[F]);
}

describe('the contact law in a run', () => {
  /** The largest rise of the force from one reading to the next over a landing, read every h. */
  const largestStep = (name: string, which: RideCase, x: 'crewX' | 'wheelX', F: 'crewF' | 'wheelF', h: number, duration: number) => {
    const rise = landing(record(name, which, h, duration).steps, x, F);
    return { first: rise[0], peak: rise[rise.length - 1], step: Math.max(...rise.slice(1).map((f, i) => f - rise[i])) };
  };

  it('the crew land after the drop test with no force step: nothing at the first step, then a rise that steps finer with the step', () => {
    const { sys, steps } = record('demo-two-crew', 'drop');
    const first = steps.findIndex((s, i) => i > 0 && steps[i - 1].crewX <= 0 && s.crewX > 0);
    const closing = steps[first].crewV; // m/s, the floor rising onto the falling person
    expect(closing).toBeGreaterThan(1);
    const coarse = largestStep('demo-two-crew', 'drop', 'crewX', 'crewF', 2e-4, 0.5);
    // A spring and damper in parallel would start at c·v (a step of about 30 % of this peak).
    expect(sys.crew[0].c * closing).toBeGreaterThan(0.2 * coarse.peak);
    expect(coarse.first).toBeLessThan(1e-3 * sys.crew[0].c * closing);
    // Continuous: a tenth of the step gives about a tenth of the largest rise per step (a jump would stay the same).
    const fine = largestStep('demo-two-crew', 'drop', 'crewX', 'crewF', 2e-5, 0.5);
    expect(fine.step / coarse.step).toBeLessThan(0.15);
    expect(coarse.step).toBeLessThan(0.05 * coarse.peak);
  });

  it('a wheel lands after the stone with no force step: it rises over the wheel spring against the ground damper', () => {
    // On turf the force through the wheel's spring (3 MN/m) fills the ground's damper over c_g/(k_w + k_g), about 0.7 ms.
    const coarse = largestStep('demo-two-crew', 'stone-ridge', 'wheelX', 'wheelF', 1e-4, 0.15);
    const fine = largestStep('demo-two-crew', 'stone-ridge', 'wheelX', 'wheelF', 1e-5, 0.15);
    expect(coarse.first).toBeLessThan(1e-3 * coarse.peak);
    expect(fine.step / coarse.step).toBeLessThan(0.15);
    expect(fine.step).toBeLessThan(0.05 * fine.peak);
  });

  it('counts a person off the floor only while the gap is open, not where the force is cut', () => {
    const a = analysis('demo-two-crew');
    const sys = buildRide(rideInput(a), 'rough-ridge').system;
    const rest = staticEquilibrium(sys);
    const N = 3 + sys.crew.length;
    const y = Float64Array.from(rest.y);
    y[N + 3] = 5; // the driver leaves the standing floor upward at 5 m/s: indentation still x_s, the force cut
    const f = newForces(sys);
    const mode = contactMode(sys, 0, y, f);
    expect(f.crewIndent[0]).toBeGreaterThan(0);
    expect(f.crew[0]).toBe(0);
    expect(crewShut(sys, mode, 0)).toBe(true); // gap shut: not airborne
    y[3] += 2 * f.crewIndent[0]; // lift them clear of the floor: the gap opens
    expect(crewShut(sys, contactMode(sys, 0, y, f), 0)).toBe(false);
  });

  it('the time off the floor the model reports is the time with the gap open', () => {
    // The teaching example's stone throws its crew; the hand-stepped record measures the open gap itself.
    const { steps } = record('teaching-flawed', 'stone-ridge');
    const open = steps.reduce((sum, s) => sum + (s.crewX <= 0 ? s.t1 - s.t0 : 0), 0) * 1e3;
    expect(open).toBeGreaterThan(20);
    const reported = rideCaseOf(rideInput(analysis('teaching-flawed')), 'stone-ridge', { duration: 1.5 }).crew[0].airborne_ms;
    expect(Math.abs(reported - open)).toBeLessThan(0.5); // ms: the two step sizes differ
  });
});
