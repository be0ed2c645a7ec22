import { Dopri5, type Rhs } from './dopri5.ts';
export type { Rhs } from './dopri5.ts';

// The ride model's adaptive integrator: the Dormand-Prince pair (dopri5.ts)
// with the step size from the PI controller of Hairer, Nørsett and Wanner
// (hairer-norsett-wanner-1993, section II.4, their DOPRI5 code: exponents
// 0.17 and 0.04, safety 0.9, the step changed by a factor between 0.2 and
// 10). Events: where the set of shut and pushing contacts (the mode) at the
// end of an accepted step differs from the start, the change is located by
// bisection on the step's dense output and the step is taken again to end
// just past it, so no step straddles a jump in the forces' law. Steps also
// end on the road's kinks (breaks).

export type Mode = (t: number, y: Float64Array) => number;

/** The last accepted step's continuous extension. */
export interface DenseOutput {
  value(i: number, t: number): number;
  at(t: number, out: Float64Array): void;
}

export interface IntegrateOptions {
  rtol: number;
  atol: number;
  /** The first trial step, s (the controller corrects it at once). */
  h0: number;
  /** Longest step, s (none where absent). */
  hMax?: number;
  /** Time within which a contact change is located, s. */
  eventTolerance: number;
  /** Times no step may straddle (kinks in the road input). */
  breaks?: readonly number[];
  /**
   * Called after every accepted step with the time, the state, the contact
   * mode held during the step and the step's dense output. Returning true
   * ends the run there (the caller has seen enough).
   */
  onStep(t0: number, t1: number, y: Float64Array, modeDuring: number, dense: DenseOutput): boolean | void;
  /** Most trial steps (accepted, rejected and retaken at an event); the run stops there. None where absent. */
  maxSteps?: number;
}

export interface IntegrateStats {
  /** Accepted steps. */
  steps: number;
  /** Trial steps rejected by the error test or cut back to an event. */
  rejected: number;
  /** Right-hand side evaluations, mode evaluations excluded. */
  evaluations: number;
  events: number;
  /** Time the run ended, s (before t1 where onStep ended it). */
  t: number;
  /** Why the run stopped before t1 without being asked to, if it did. */
  stopped?: string;
}

const SAFETY = 0.9, EXPO = 0.17, BETA = 0.04, SHRINK = 0.2, GROW = 10;

export function integrate(f: Rhs, mode: Mode, y0: Float64Array, t0: number, t1: number, o: IntegrateOptions): IntegrateStats {
  const n = y0.length;
  const rk = new Dopri5(f, n);
  const y = Float64Array.from(y0), probe = new Float64Array(n);
  const breaks = [...(o.breaks ?? [])].filter((b) => b > t0 && b < t1).sort((a, b) => a - b);
  const hMax = o.hMax ?? t1 - t0;
  let nextBreak = 0;
  let t = t0, m = mode(t, y), h = Math.min(o.h0, hMax), errOld = 1e-4;
  let steps = 0, rejected = 0, events = 0, trials = 0;
  /** A step cut back to just past a located event: taken at that length, whatever the controller says. */
  let cut = 0;
  f(t, y, rk.k1);
  let evaluations = 1;
  while (t < t1 - 1e-12) {
    if (trials >= (o.maxSteps ?? Infinity)) {
      return { steps, rejected, evaluations, events, t, stopped: `the integration stopped at ${t.toFixed(3)} s of ${t1.toFixed(3)} s after ${trials} trial steps (${events} contact events), its limit` };
    }
    while (nextBreak < breaks.length && breaks[nextBreak] <= t + 1e-12) nextBreak++;
    const end = nextBreak < breaks.length ? breaks[nextBreak] : t1;
    const hTry = cut > 0 ? cut : Math.min(h, hMax, end - t);
    trials++;
    const err = rk.step(t, y, hTry, o.rtol, o.atol);
    evaluations += 6;
    const grow = err > 0 ? err ** EXPO : 0;
    if (err > 1) {
      rejected++;
      cut = 0;
      h = hTry / Math.min(1 / SHRINK, grow / SAFETY);
      continue;
    }
    rk.dense(t, y, hTry);
    const mEnd = mode(t + hTry, rk.y1);
    if (mEnd !== m) {
      const at = firstChange(rk, mode, m, t, t + hTry, o.eventTolerance, probe);
      if (at < t + hTry - o.eventTolerance) {
        rejected++;
        cut = at - t;
        continue;
      }
      events++;
    }
    cut = 0;
    steps++;
    rk.carry();
    const tNew = t + hTry >= end - 1e-12 ? end : t + hTry;
    const stop = o.onStep(t, tNew, rk.y1, m, rk);
    y.set(rk.y1);
    t = tNew;
    m = mEnd;
    // The PI controller: the last error damps the change.
    h = hTry / Math.max(1 / GROW, Math.min(1 / SHRINK, grow / (errOld ** BETA) / SAFETY));
    errOld = Math.max(err, 1e-4);
    if (stop) break;
  }
  return { steps, rejected, evaluations, events, t };
}

/** A time in (a, b] where the mode on the dense output turns from m, to within tol (bisection; b differs): the first change where the mode changes once in the step. */
function firstChange(d: DenseOutput, mode: Mode, m: number, a: number, b: number, tol: number, probe: Float64Array): number {
  let lo = a, hi = b;
  while (hi - lo > tol) {
    const mid = 0.5 * (lo + hi);
    d.at(mid, probe);
    if (mode(mid, probe) === m) lo = mid;
    else hi = mid;
  }
  return hi;
}
