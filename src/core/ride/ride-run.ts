import { G } from '../units/units.ts';
import type { BuiltRide } from './ride-build.ts';
import { decayCycles, TurningPoints, type Enough } from './decay.ts';
import { integrate, type DenseOutput } from './integrate.ts';
import { PeakSet } from './peak-set.ts';
import { anyWheelPushes, contactMode, crewShut, derivative, newForces, stateSize, wheelShut } from './ride-system.ts';
import type { RideChannel, RideResult, RideCase } from './ride-types.ts';
import { staticEquilibrium } from './static-equilibrium.ts';

// One ride case from its built system: the static equilibrium, the run by
// the adaptive Dormand-Prince integrator with contact events, and the results
// (mechanics note, section 8).

export interface RunSettings {
  duration: number;
  sampleInterval: number;
  /** Decay measured down to this fraction of the first amplitude. */
  decayFraction: number;
  /** The integrator's relative tolerance (RIDE_TOLERANCE where absent). */
  tolerance?: number;
  /** Most trial steps (MAX_RIDE_STEPS where absent). */
  maxSteps?: number;
  /** Ends the run early once it returns true, given each crew member's turning points so far and the first wheel contact (a short run for the tuner). */
  enough?: Enough;
  /** False: no time series is kept and no sample taken (the result's series is empty); the peaks never read the samples. */
  series?: boolean;
  /**
   * Keep only the samples a plot of about this many points draws: every k-th and the last, k = ceil(samples / points)
   * (the series says its stride). The others are not taken at all. Absent: every sample.
   */
  plotPoints?: number;
  title: string;
}

/**
 * The integrator's relative tolerance (the absolute one is a thousandth of it,
 * in metres and metres per second, as in the odex reference): a decade
 * tighter than the loosest that keeps the crew's rise and the peak wheel
 * force within 0.1 % of odex at 1e-10 on the demonstration builds' five
 * cases (1e-4 keeps both, 1e-3 the two-crew demo alone; bench/ride.ts
 * searches it over all five).
 */
export const RIDE_TOLERANCE = 1e-5;

const TITLES: Record<RideCase, string> = {
  'rough-ridge': 'rough-ground ridge across both tracks',
  'rough-one-wheel': 'rough-ground ridge under one wheel',
  'stone-ridge': 'stone strike under both wheels',
  'stone-one-wheel': 'stone strike under one wheel',
  drop: 'drop test',
};
export const rideTitle = (c: RideCase) => TITLES[c];

/**
 * Most trial steps in one case, rejected ones and events included: the
 * demonstration builds take a few hundred to a few thousand; at this many some
 * part of the model is far from a real chariot (a mass or stiffness so far off
 * that its period is a few microseconds), and a run would take minutes.
 */
export const MAX_RIDE_STEPS = 200_000;

/**
 * Points at which each accepted step is read for the peaks: two inside, on
 * the dense output, and its end (the plots' samples are not read for them).
 * With the parabola through a peak's neighbours (peak-set.ts) this keeps the
 * peak wheel force of the demonstration builds' drop and stone strikes within
 * 0.04 % of odex at 1e-10 at every tolerance from 1e-4 down (bench/ride.ts
 * reads them so); the end alone left 0.1-1 %.
 */
const INNER = 3;

/** Why the model cannot be integrated at all, or null. */
function unfit(period: number): string | null {
  return period > 0 && Number.isFinite(period) ? null : 'the shortest period of the model is not a positive number (a stiffness or mass of the model is not known)';
}

/** A case that could not be run: every measure NaN (not a number the rules can judge), the reason kept. */
function notRun(b: BuiltRide, which: RideCase, title: string, reason: string): RideResult {
  const sys = b.system;
  return {
    case: which,
    title,
    crew: sys.crew.map((c) => ({ role: c.role, rise_mm: NaN, airborne_ms: NaN, floor_dlf: NaN, lift_mm: NaN, decay_cycles: null })),
    wheels: sys.wheels.map((w) => ({ wheel: w.side, airborne_ms: NaN, dlf: NaN })),
    yokeForceMin_N: NaN,
    yokeForceMax_N: NaN,
    yokeForceStatic_N: NaN,
    decayCycles: null,
    method: `not run: ${reason}`,
    stopped: reason,
    steps: 0,
    series: { t_s: [], channels: [] },
    floorDamping: b.floorDamping,
    working: b.working,
    sources: b.sources,
  };
}

export function runRide(b: BuiltRide, which: RideCase, s: RunSettings): RideResult {
  const sys = b.system;
  const n = sys.crew.length, N = 3 + n;
  const trouble = b.unknown ?? unfit(b.shortestPeriod);
  if (trouble) return notRun(b, which, s.title, trouble);
  let rest: ReturnType<typeof staticEquilibrium>;
  try {
    rest = staticEquilibrium(sys);
  } catch (e) {
    return notRun(b, which, s.title, (e as Error).message);
  }
  const y0 = Float64Array.from(rest.y);
  if (b.drop > 0) for (let i = 0; i < N; i++) if (i !== 1 && i !== 2) y0[i] += b.drop;
  const scratch = newForces(sys), forces = newForces(sys);
  const dyScratch = new Float64Array(stateSize(sys)), probe = new Float64Array(stateSize(sys));
  const wheelCount = sys.wheels.length;

  const crewStatic = sys.crew.map((_, i) => rest.y[3 + i]);
  // The peaks recorded together, one quantity each: every crew member's rise, lift and floor force, every wheel's
  // ground force, and the yoke force up and down.
  const RISE = 0, LIFT = n, FLOOR = 2 * n, WHEEL = 3 * n, YOKE = 3 * n + wheelCount, YOKE_LOW = YOKE + 1;
  const peaks = new PeakSet(YOKE_LOW + 1);
  const seen = peaks.value, peak = peaks.max;
  const crewAir = sys.crew.map(() => 0);
  const wheelAir = sys.wheels.map(() => 0);
  let firstContact = b.drop > 0 ? NaN : b.inputEnd;
  const turning = sys.crew.map((_, i) => new TurningPoints(crewStatic[i], 3 + i, N + 3 + i));
  const turningPoints = turning.map((tp) => tp.points);

  const t_s: number[] = [];
  const ch = (name: string, unit: string): RideChannel => ({ name, unit, values: [] });
  const crewCh = sys.crew.map((c) => [ch(`${c.role} height`, 'mm'), ch(`${c.role} floor force`, 'N')]);
  const wheelCh = sys.wheels.map((w) => [ch(`${w.side} wheel centre height`, 'mm'), ch(`${w.side} wheel ground force`, 'N')]);
  const yokeCh = ch('yoke force', 'N');
  const wheelRest = sys.wheels.map((w) => rest.y[0] + (sys.axleX - sys.body.x) * rest.y[1] + (w.y - sys.body.y) * rest.y[2]);
  /**
   * The peaks' record at one point: the start, then INNER points of every step in time order. The plots' samples are
   * not read for the peaks, so the peaks are the same at any sample interval and with no series at all.
   */
  const record = (t: number, y: ArrayLike<number>) => {
    derivative(sys, t, y, dyScratch, forces);
    for (let i = 0; i < n; i++) {
      const c = sys.crew[i];
      seen[RISE + i] = y[3 + i] - crewStatic[i];
      seen[LIFT + i] = y[3 + i] - (y[0] + (c.x - sys.body.x) * y[1] + (c.y - sys.body.y) * y[2]);
      seen[FLOOR + i] = forces.crew[i];
    }
    for (let i = 0; i < wheelCount; i++) seen[WHEEL + i] = forces.wheel[i];
    seen[YOKE] = forces.yoke;
    seen[YOKE_LOW] = -forces.yoke;
    peaks.add(t);
  };
  const keep = s.series !== false;
  /** The series at one sample (taken only where a series is kept). */
  const sample = (t: number, y: ArrayLike<number>) => {
    derivative(sys, t, y, dyScratch, forces);
    t_s.push(t);
    // Plain loops: a sample is taken every few steps.
    for (let i = 0; i < n; i++) {
      crewCh[i][0].values.push((y[3 + i] - crewStatic[i]) * 1e3);
      crewCh[i][1].values.push(forces.crew[i]);
    }
    for (let i = 0; i < wheelCount; i++) {
      wheelCh[i][0].values.push((y[0] + (sys.axleX - sys.body.x) * y[1] + (sys.wheels[i].y - sys.body.y) * y[2] - wheelRest[i]) * 1e3);
      wheelCh[i][1].values.push(forces.wheel[i]);
    }
    yokeCh.values.push(forces.yoke);
  };
  record(0, y0);
  // The samples a run to its end takes, counted as the run steps to them, and the stride a plot of them keeps.
  let planned = 1;
  for (let t = s.sampleInterval; t <= s.duration + 1e-12; t += s.sampleInterval) planned++;
  const stride = s.plotPoints ? Math.max(1, Math.ceil(planned / s.plotPoints)) : 1;
  let taken = 0;
  if (keep) sample(0, y0);
  let nextSample = s.sampleInterval;
  const v0 = new Float64Array(n);
  for (let i = 0; i < n; i++) v0[i] = y0[N + 3 + i];

  const tolerance = s.tolerance ?? RIDE_TOLERANCE;
  const stats = integrate(
    (t, y, dy) => derivative(sys, t, y, dy),
    (t, y) => contactMode(sys, t, y, scratch),
    y0, 0, s.duration,
    {
      rtol: tolerance,
      atol: tolerance * 1e-3,
      h0: b.shortestPeriod / 60,
      eventTolerance: 1e-9,
      breaks: b.breaks,
      maxSteps: s.maxSteps ?? MAX_RIDE_STEPS,
      onStep(t0: number, t1: number, y: Float64Array, mode: number, dense: DenseOutput) {
        const dt = t1 - t0;
        // Off the ground or the floor only while the gap is open, not where the contact law has cut the force.
        for (let i = 0; i < wheelCount; i++) if (!wheelShut(mode, i)) wheelAir[i] += dt;
        for (let i = 0; i < n; i++) if (!crewShut(sys, mode, i)) crewAir[i] += dt;
        if (Number.isNaN(firstContact) && anyWheelPushes(sys, mode)) firstContact = t0;
        // The series and the peaks read the dense output between the step's ends, each at its own points: the plots' samples
        // every sample interval, the peaks at INNER points a step (refined by a parabola through a peak's neighbours: peak-set.ts).
        for (let j = 1; j <= INNER; j++) {
          const tj = t0 + (dt * j) / INNER;
          for (; keep && nextSample <= tj + 1e-12; nextSample += s.sampleInterval) {
            if (++taken % stride !== 0 && taken !== planned - 1) continue;
            dense.at(Math.min(nextSample, t1), probe);
            sample(nextSample, probe);
          }
          if (j < INNER) dense.at(tj, probe);
          record(tj, j < INNER ? probe : y);
        }
        for (let i = 0; i < n; i++) {
          turning[i].step(t0, t1, v0[i], y[N + 3 + i], dense);
          v0[i] = y[N + 3 + i];
        }
        return s.enough?.(turningPoints, firstContact) ?? false;
      },
    },
  );

  if (stats.stopped) return notRun(b, which, s.title, stats.stopped);
  // A run that ended before its last planned sample (an early end) cannot say which sample was last: run it with all.
  if (stride > 1 && taken !== planned - 1) return runRide(b, which, { ...s, plotPoints: undefined });
  const rises = sys.crew.map((_, i) => Math.max(0, peak[RISE + i], ...turningPoints[i].map((q) => q.z)));
  const decays = turning.map((tp) => decayCycles(tp.points, s.decayFraction, Number.isNaN(firstContact) ? Infinity : firstContact));
  const anyNever = decays.some((d) => d.cycles === null);
  const shortRun = stats.t < s.duration - 1e-9 ? `, ended at ${stats.t.toFixed(3)} s once the decay was decided` : '';
  return {
    case: which,
    title: s.title,
    crew: sys.crew.map((c, i) => ({
      role: c.role,
      rise_mm: rises[i] * 1e3,
      airborne_ms: crewAir[i] * 1e3,
      floor_dlf: peak[FLOOR + i] / (c.m * G),
      lift_mm: Math.max(0, peak[LIFT + i]) * 1e3,
      decay_cycles: decays[i].cycles,
    })),
    wheels: sys.wheels.map((w, i) => ({ wheel: w.side, airborne_ms: wheelAir[i] * 1e3, dlf: peak[WHEEL + i] / rest.forces.wheel[i] })),
    yokeForceMin_N: -peak[YOKE_LOW],
    yokeForceMax_N: peak[YOKE],
    yokeForceStatic_N: rest.forces.yoke,
    decayCycles: anyNever ? null : Math.max(...decays.map((d) => d.cycles!)),
    method: `Dormand-Prince 5(4) with its dense output, adaptive step (relative tolerance ${tolerance}, absolute ${tolerance * 1e-3} m and m/s; ${stats.steps} steps accepted, ${stats.rejected} rejected or cut back, ${stats.evaluations} evaluations), every contact opening and closing located on the dense output to 1 ns and the step ended there (${stats.events} events); peaks read on the dense output at ${INNER} points a step and refined by a parabola, the series sampled on it${shortRun}`,
    steps: stats.steps,
    series: keep ? { t_s, channels: [...crewCh.flat(), ...wheelCh.flat(), yokeCh], ...(stride > 1 ? { stride } : {}) } : { t_s: [], channels: [] },
    floorDamping: b.floorDamping,
    working: b.working,
    sources: b.sources,
  };
}
