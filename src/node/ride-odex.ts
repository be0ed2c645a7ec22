// The ride model's equations integrated by odex instead of the core's
// Dormand-Prince integrator: the reference the tests and the benchmark
// compare the core against. Read on odex's dense output at an even interval,
// or at points inside each of its steps as the core reads its own; the peaks
// refined between those points as the core refines its own (peak-tracker.ts).
import type { BuiltRide } from '../core/ride/ride-build.ts';
import { derivative, newForces, stateSize } from '../core/ride/ride-system.ts';
import { staticEquilibrium } from '../core/ride/static-equilibrium.ts';
import { PeakTracker } from '../core/ride/peak-tracker.ts';
import { odexSolve } from './odex-solver.ts';

export interface OdexRide {
  /** Largest rise of each crew member above the static position, mm. */
  rise_mm: number[];
  /** Largest ground force of each wheel over its static force (the wheel's dynamic factor). */
  wheel_dlf: number[];
  nEval: number;
  nStep: number;
}

/** How odex's solution is read: at an even interval, or at points evenly spaced inside each accepted step (its end among them). */
export type OdexReading = { interval: number } | { perStep: number };

/** One built case over `duration` s (built outside, so that a benchmark times the integration alone). */
export function rideByOdex(b: BuiltRide, duration: number, relativeTolerance = 1e-10, reading: OdexReading = { interval: 5e-5 }): OdexRide {
  const sys = b.system;
  const N = 3 + sys.crew.length;
  const rest = staticEquilibrium(sys);
  const y0 = Array.from(rest.y);
  if (b.drop > 0) for (let k = 0; k < N; k++) if (k !== 1 && k !== 2) y0[k] += b.drop;
  const n = stateSize(sys);
  const dy = new Float64Array(n), forces = newForces(sys), probe = new Array<number>(n);
  const rise = sys.crew.map(() => new PeakTracker()), wheel = sys.wheels.map(() => new PeakTracker());
  const at = (t: number, y: ArrayLike<number>) => {
    derivative(sys, t, y, dy, forces);
    sys.crew.forEach((_, k) => rise[k].add(t, y[3 + k] - rest.y[3 + k]));
    sys.wheels.forEach((_, k) => wheel[k].add(t, forces.wheel[k]));
  };
  at(0, y0);
  const perStep = 'perStep' in reading ? reading.perStep : 0;
  const r = odexSolve((t, y) => { derivative(sys, t, y, dy); return Array.from(dy); }, 0, y0, duration, {
    relativeTolerance,
    absoluteTolerance: relativeTolerance * 1e-3,
    ...('interval' in reading
      ? { grid: { interval: reading.interval, at } }
      : {
          steps(t0: number, t1: number, y: number[], dense: (i: number, t: number) => number) {
            for (let j = 1; j < perStep; j++) {
              const tj = t0 + ((t1 - t0) * j) / perStep;
              for (let i = 0; i < n; i++) probe[i] = dense(i, tj);
              at(tj, probe);
            }
            at(t1, y);
          },
        }),
  });
  return { rise_mm: rise.map((p) => p.max * 1e3), wheel_dlf: wheel.map((p, k) => p.max / rest.forces.wheel[k]), nEval: r.nEval, nStep: r.nStep };
}
