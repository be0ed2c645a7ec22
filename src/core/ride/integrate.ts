// Classical fourth-order Runge-Kutta at a fixed step, with event location:
// where the set of pushing contacts changes within a step, the step is cut
// back by bisection to just past the change (to a set time tolerance), so no
// step straddles a jump in the forces.

export type Rhs = (t: number, y: Float64Array, dy: Float64Array) => void;
export type Mode = (t: number, y: Float64Array) => number;

export interface IntegrateOptions {
  h: number;
  /** Time within which a contact change is located, s. */
  eventTolerance: number;
  /** Times no step may straddle (kinks in the road input). */
  breaks?: readonly number[];
  /** Called after every step with the time, the state and the contact mode held during the step. */
  onStep(t0: number, t1: number, y: Float64Array, modeDuring: number): void;
  /** Most steps, event bisection included; the run stops there (contacts chattering at every step). None where absent. */
  maxSteps?: number;
}

export interface IntegrateStats {
  steps: number;
  events: number;
  /** Why the run stopped before t1, if it did. */
  stopped?: string;
}

export function rk4Stepper(n: number, f: Rhs) {
  const k1 = new Float64Array(n), k2 = new Float64Array(n), k3 = new Float64Array(n), k4 = new Float64Array(n), tmp = new Float64Array(n);
  return (t: number, y: Float64Array, h: number, out: Float64Array) => {
    f(t, y, k1);
    for (let i = 0; i < n; i++) tmp[i] = y[i] + 0.5 * h * k1[i];
    f(t + 0.5 * h, tmp, k2);
    for (let i = 0; i < n; i++) tmp[i] = y[i] + 0.5 * h * k2[i];
    f(t + 0.5 * h, tmp, k3);
    for (let i = 0; i < n; i++) tmp[i] = y[i] + h * k3[i];
    f(t + h, tmp, k4);
    for (let i = 0; i < n; i++) out[i] = y[i] + (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
  };
}

export function integrate(f: Rhs, mode: Mode, y0: Float64Array, t0: number, t1: number, o: IntegrateOptions): IntegrateStats {
  const n = y0.length;
  const step = rk4Stepper(n, f);
  const y = Float64Array.from(y0), next = new Float64Array(n), trial = new Float64Array(n);
  let t = t0, m = mode(t, y), steps = 0, events = 0;
  while (t < t1 - 1e-12) {
    if (steps >= (o.maxSteps ?? Infinity)) return { steps, events, stopped: `the integration stopped at ${t.toFixed(3)} s of ${t1.toFixed(3)} s after ${steps} steps (${events} contact events), its limit` };
    let h = Math.min(o.h, t1 - t);
    for (const b of o.breaks ?? []) if (b > t + 1e-12 && b < t + h) h = b - t;
    step(t, y, h, next);
    steps++;
    let mNext = mode(t + h, next);
    if (mNext !== m) {
      let lo = 0, hi = h;
      while (hi - lo > o.eventTolerance) {
        const mid = 0.5 * (lo + hi);
        step(t, y, mid, trial);
        steps++;
        const mm = mode(t + mid, trial);
        if (mm === m) lo = mid;
        else [hi, mNext] = [mid, mm];
      }
      if (hi < h) {
        h = hi;
        step(t, y, h, next);
      }
      events++;
    }
    o.onStep(t, t + h, next, m);
    t += h;
    y.set(next);
    m = mNext;
  }
  return { steps, events };
}
