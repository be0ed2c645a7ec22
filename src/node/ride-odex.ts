// The ride model's equations integrated by odex instead of the core's
// Dormand-Prince integrator: the reference the tests and the benchmark
// compare the core against. Read on odex's dense output at an even interval;
// the peaks refined between those points as the core refines its own
// (peak-tracker.ts).
import { buildRide, type RideInput } from '../core/ride/ride-build.ts';
import { derivative, newForces, stateSize } from '../core/ride/ride-system.ts';
import type { RideCase } from '../core/ride/ride-types.ts';
import { staticEquilibrium } from '../core/ride/static-equilibrium.ts';
import { rideParam } from '../core/ride/ride-data.ts';
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

export function rideByOdex(i: RideInput, which: RideCase, relativeTolerance = 1e-10, interval = 5e-5): OdexRide {
  const b = buildRide(i, which);
  const sys = b.system;
  const N = 3 + sys.crew.length;
  const rest = staticEquilibrium(sys);
  const y0 = Array.from(rest.y);
  if (b.drop > 0) for (let k = 0; k < N; k++) if (k !== 1 && k !== 2) y0[k] += b.drop;
  const dy = new Float64Array(stateSize(sys)), forces = newForces(sys);
  const rise = sys.crew.map(() => new PeakTracker()), wheel = sys.wheels.map(() => new PeakTracker());
  const duration = rideParam(i.data, 'ride.inputs', 'duration_s').value;
  const r = odexSolve((t, y) => { derivative(sys, t, y, dy); return Array.from(dy); }, 0, y0, duration, {
    relativeTolerance,
    absoluteTolerance: relativeTolerance * 1e-3,
    grid: {
      interval,
      at: (t, y) => {
        derivative(sys, t, y, dy, forces);
        sys.crew.forEach((_, k) => rise[k].add(t, y[3 + k] - rest.y[3 + k]));
        sys.wheels.forEach((_, k) => wheel[k].add(t, forces.wheel[k]));
      },
    },
  });
  return { rise_mm: rise.map((p) => p.max * 1e3), wheel_dlf: wheel.map((p, k) => p.max / rest.forces.wheel[k]), nEval: r.nEval, nStep: r.nStep };
}
