import { G } from '../units/units.ts';
import type { BuiltRide } from './ride-build.ts';
import { decayCycles, TurningPoints } from './decay.ts';
import { integrate } from './integrate.ts';
import { anyWheelPushes, contactMode, crewShut, derivative, newForces, stateSize, wheelShut } from './ride-system.ts';
import type { RideChannel, RideResult, RideCase } from './ride-types.ts';
import { staticEquilibrium } from './static-equilibrium.ts';

// One ride case from its built system: the static equilibrium, the run by
// RK4 with contact events, and the results (mechanics note, section 8).

export interface RunSettings {
  duration: number;
  sampleInterval: number;
  /** Decay measured down to this fraction of the first amplitude. */
  decayFraction: number;
  /** Step as a fraction of the shortest period. */
  stepsPerPeriod?: number;
  title: string;
}

const TITLES: Record<RideCase, string> = {
  'rough-ridge': 'rough-ground ridge across both tracks',
  'rough-one-wheel': 'rough-ground ridge under one wheel',
  'stone-ridge': 'stone strike under both wheels',
  'stone-one-wheel': 'stone strike under one wheel',
  drop: 'drop test',
};
export const rideTitle = (c: RideCase) => TITLES[c];

/**
 * Most RK4 steps in one case, contact events included: the demonstration
 * builds take 3,000 to 6,500; at this many the step is so short that some
 * part of the model is far from a real chariot, and a run would take minutes.
 */
export const MAX_RIDE_STEPS = 200_000;

/** Why the fixed step cannot carry the run, or null. */
function stepTrouble(h: number, period: number, duration: number): string | null {
  if (!(h > 0) || !Number.isFinite(h)) return 'the integration step is not a positive number (a stiffness or mass of the model is not known)';
  const steps = Math.ceil(duration / h);
  if (steps > MAX_RIDE_STEPS) return `a fixed step of ${(h * 1e6).toFixed(2)} µs (1/60 of the shortest period, ${(period * 1e3).toFixed(3)} ms) would take ${steps} steps over the ${duration} s run, more than the ${MAX_RIDE_STEPS} allowed`;
  return null;
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
  // A fraction of the shortest period, and half the ground point's time constant (RK4 is then accurate on its decay).
  const h = Math.min(1e-3, b.shortestPeriod / (s.stepsPerPeriod ?? 60), b.shortestTimeConstant / 2);
  const unfit = b.unknown ?? stepTrouble(h, b.shortestPeriod, s.duration);
  if (unfit) return notRun(b, which, s.title, unfit);
  let rest: ReturnType<typeof staticEquilibrium>;
  try {
    rest = staticEquilibrium(sys);
  } catch (e) {
    return notRun(b, which, s.title, (e as Error).message);
  }
  const y0 = Float64Array.from(rest.y);
  if (b.drop > 0) for (let i = 0; i < N; i++) if (i !== 1 && i !== 2) y0[i] += b.drop;
  const scratch = newForces(sys), forces = newForces(sys);
  const dyScratch = new Float64Array(stateSize(sys));
  const wheelCount = sys.wheels.length;

  const crewStatic = sys.crew.map((_, i) => rest.y[3 + i]);
  const crewRise = sys.crew.map(() => 0), crewLift = sys.crew.map(() => 0), crewAir = sys.crew.map(() => 0), crewPeak = sys.crew.map(() => 0);
  const wheelAir = sys.wheels.map(() => 0), wheelPeak = sys.wheels.map(() => 0);
  let yokeMin = Infinity, yokeMax = -Infinity, firstContact = b.drop > 0 ? NaN : b.inputEnd;
  const turning = sys.crew.map(() => new TurningPoints());

  const t_s: number[] = [];
  const ch = (name: string, unit: string): RideChannel => ({ name, unit, values: [] });
  const crewCh = sys.crew.map((c) => [ch(`${c.role} height`, 'mm'), ch(`${c.role} floor force`, 'N')]);
  const wheelCh = sys.wheels.map((w) => [ch(`${w.side} wheel centre height`, 'mm'), ch(`${w.side} wheel ground force`, 'N')]);
  const yokeCh = ch('yoke force', 'N');
  let nextSample = 0;
  const prev = Float64Array.from(y0);
  const sample = (t: number, y: ArrayLike<number>) => {
    derivative(sys, t, y, dyScratch, forces);
    t_s.push(t);
    sys.crew.forEach((_, i) => { crewCh[i][0].values.push((y[3 + i] - crewStatic[i]) * 1e3); crewCh[i][1].values.push(forces.crew[i]); });
    sys.wheels.forEach((w, i) => { wheelCh[i][0].values.push((y[0] + (sys.axleX - sys.body.x) * y[1] + (w.y - sys.body.y) * y[2] - (rest.y[0] + (sys.axleX - sys.body.x) * rest.y[1] + (w.y - sys.body.y) * rest.y[2])) * 1e3); wheelCh[i][1].values.push(forces.wheel[i]); });
    yokeCh.values.push(forces.yoke);
  };
  sample(0, y0);
  nextSample = s.sampleInterval;
  const interp = new Float64Array(y0.length);
  for (let i = 0; i < n; i++) turning[i].add(0, y0[3 + i] - crewStatic[i], y0[N + 3 + i]);

  const stats = integrate(
    (t, y, dy) => derivative(sys, t, y, dy),
    (t, y) => contactMode(sys, t, y, scratch),
    y0, 0, s.duration,
    {
      h,
      eventTolerance: 1e-9,
      breaks: b.breaks,
      maxSteps: MAX_RIDE_STEPS,
      onStep(t0, t1, y, mode) {
        const dt = t1 - t0;
        // Off the ground or the floor only while the gap is open, not where the contact law has cut the force.
        for (let i = 0; i < wheelCount; i++) if (!wheelShut(mode, i)) wheelAir[i] += dt;
        for (let i = 0; i < n; i++) if (!crewShut(sys, mode, i)) crewAir[i] += dt;
        if (Number.isNaN(firstContact) && anyWheelPushes(sys, mode)) firstContact = t0;
        derivative(sys, t1, y, dyScratch, forces);
        for (let i = 0; i < n; i++) {
          const c = sys.crew[i];
          crewRise[i] = Math.max(crewRise[i], y[3 + i] - crewStatic[i]);
          const floorAt = y[0] + (c.x - sys.body.x) * y[1] + (c.y - sys.body.y) * y[2];
          crewLift[i] = Math.max(crewLift[i], y[3 + i] - floorAt);
          crewPeak[i] = Math.max(crewPeak[i], forces.crew[i]);
          turning[i].add(t1, y[3 + i] - crewStatic[i], y[N + 3 + i]);
        }
        for (let i = 0; i < wheelCount; i++) wheelPeak[i] = Math.max(wheelPeak[i], forces.wheel[i]);
        yokeMin = Math.min(yokeMin, forces.yoke);
        yokeMax = Math.max(yokeMax, forces.yoke);
        while (nextSample <= t1 + 1e-12) {
          const a = (nextSample - t0) / dt;
          for (let k = 0; k < y0.length; k++) interp[k] = prev[k] + a * (y[k] - prev[k]);
          sample(nextSample, interp);
          nextSample += s.sampleInterval;
        }
        prev.set(y);
      },
    },
  );

  if (stats.stopped) return notRun(b, which, s.title, stats.stopped);
  const decays = turning.map((tp) => decayCycles(tp.points, s.decayFraction, Number.isNaN(firstContact) ? Infinity : firstContact));
  const anyNever = decays.some((d) => d.cycles === null);
  return {
    case: which,
    title: s.title,
    crew: sys.crew.map((c, i) => ({
      role: c.role,
      rise_mm: crewRise[i] * 1e3,
      airborne_ms: crewAir[i] * 1e3,
      floor_dlf: crewPeak[i] / (c.m * G),
      lift_mm: crewLift[i] * 1e3,
      decay_cycles: decays[i].cycles,
    })),
    wheels: sys.wheels.map((w, i) => ({ wheel: w.side, airborne_ms: wheelAir[i] * 1e3, dlf: wheelPeak[i] / rest.forces.wheel[i] })),
    yokeForceMin_N: yokeMin,
    yokeForceMax_N: yokeMax,
    yokeForceStatic_N: rest.forces.yoke,
    decayCycles: anyNever ? null : Math.max(...decays.map((d) => d.cycles!)),
    method: `classical Runge-Kutta (RK4), fixed step ${(h * 1e3).toFixed(3)} ms (the least of 1/${s.stepsPerPeriod ?? 60} of the shortest period ${(b.shortestPeriod * 1e3).toFixed(1)} ms, half the ground's time constant ${Number.isFinite(b.shortestTimeConstant) ? `${(b.shortestTimeConstant * 1e3).toFixed(2)} ms` : '(none)'} and 1 ms), contact changes located by bisection to 1 ns (${stats.events} events)`,
    steps: stats.steps,
    series: { t_s, channels: [...crewCh.flat(), ...wheelCh.flat(), yokeCh] },
    floorDamping: b.floorDamping,
    working: b.working,
    sources: b.sources,
  };
}
