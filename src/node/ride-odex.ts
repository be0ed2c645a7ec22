// The ride model's equations integrated by odex instead of the core's RK4:
// the reference the tests and the benchmark compare the core against.
import { buildRide, type RideInput } from '../core/ride/ride-build.ts';
import { derivative, stateSize } from '../core/ride/ride-system.ts';
import type { RideCase } from '../core/ride/ride-types.ts';
import { staticEquilibrium } from '../core/ride/static-equilibrium.ts';
import { rideParam } from '../core/ride/ride-data.ts';
import { odexSolve } from './odex-solver.ts';

export interface OdexRide {
  /** Largest rise of each crew member above the static position, mm. */
  rise_mm: number[];
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
  const dy = new Float64Array(stateSize(sys));
  const rise = sys.crew.map(() => 0);
  const duration = rideParam(i.data, 'ride.inputs', 'duration_s').value;
  const r = odexSolve((t, y) => { derivative(sys, t, y, dy); return Array.from(dy); }, 0, y0, duration, {
    relativeTolerance,
    absoluteTolerance: relativeTolerance * 1e-3,
    grid: { interval, at: (_t, y) => sys.crew.forEach((_, k) => (rise[k] = Math.max(rise[k], y[3 + k] - rest.y[3 + k]))) },
  });
  return { rise_mm: rise.map((v) => v * 1e3), nEval: r.nEval, nStep: r.nStep };
}
