// Least-squares fit of x(t) = A e^{-zeta w_n tau} cos(w_d tau + phi) + c,
// w_d = w_n sqrt(1 - zeta^2), by Levenberg-Marquardt (ml-levenberg-marquardt)
// with the exact Jacobian. Time is scaled by the first guess of w_n and
// displacement by the first guess of |A|, so every parameter is of order one
// and the method's fixed damping term treats them alike.

import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import type { DampedSineFit } from './floor-test-types.ts';

export interface FitStart {
  amplitude_mm: number;
  damping_ratio: number;
  natural_frequency_hz: number;
  phase_rad: number;
  offset_mm: number;
}

const MAX_DAMPING_RATIO = 0.9;

/** tau_s: time since the start of the free vibration; x_mm: the samples. */
export function fitDampedSine(tau_s: readonly number[], x_mm: readonly number[], start: FitStart): DampedSineFit {
  const w0 = 2 * Math.PI * start.natural_frequency_hz;
  const a0 = Math.abs(start.amplitude_mm) || 1;
  const s = tau_s.map((t) => t * w0);
  const y = x_mm.map((v) => v / a0);
  // p = [A / a0, zeta, w_n / w0, phi, c / a0]
  const model = ([A, z, r, phi, c]: number[]) => dampedSine(A, z, r, phi, c);
  const jacobian = ([A, z, r, phi]: number[]) => {
    const root = Math.sqrt(1 - z * z);
    const wd = r * root;
    return (t: number) => {
      const e = Math.exp(-z * r * t);
      const cos = Math.cos(wd * t + phi);
      const sin = Math.sin(wd * t + phi);
      return [
        e * cos,
        A * e * t * r * (-cos + (sin * z) / root),
        A * e * t * (-z * cos - sin * root),
        -A * e * sin,
        1,
      ];
    };
  };
  const initial = [start.amplitude_mm / a0, start.damping_ratio, 1, start.phase_rad, start.offset_mm / a0];
  const result = levenbergMarquardt({ x: s, y }, model, {
    initialValues: initial,
    jacobianFunction: jacobian,
    minValues: [-100, 0, 0.5, -2 * Math.PI, -100],
    maxValues: [100, MAX_DAMPING_RATIO, 2, 2 * Math.PI, 100],
    maxIterations: 100,
    errorTolerance: 0,
    improvementThreshold: 1e-3,
  });
  const [A, z, r, phi, c] = result.parameterValues;
  // parameterError is the sum of squared residuals in the scaled units.
  return {
    amplitude_mm: A * a0,
    damping_ratio: z,
    natural_frequency_hz: (r * w0) / (2 * Math.PI),
    phase_rad: phi,
    offset_mm: c * a0,
    rms_mm: Math.sqrt(result.parameterError / s.length) * a0,
    iterations: result.iterations,
  };
}

/** The fitted curve at the given times since the start of the free vibration. */
export function dampedSineAt(fit: DampedSineFit, tau_s: readonly number[]): number[] {
  return tau_s.map(dampedSine(fit.amplitude_mm, fit.damping_ratio, 2 * Math.PI * fit.natural_frequency_hz, fit.phase_rad, fit.offset_mm));
}

/** x(t) = A e^{-zeta w_n t} cos(w_n sqrt(1 - zeta^2) t + phi) + c. */
export function dampedSine(A: number, zeta: number, wn: number, phi: number, c: number): (t: number) => number {
  const wd = wn * Math.sqrt(1 - zeta * zeta);
  return (t) => A * Math.exp(-zeta * wn * t) * Math.cos(wd * t + phi) + c;
}
