// What the floor-test estimator takes and gives back. Times in seconds,
// displacements in millimetres, as the record holds them.

import { say, type MessageKey } from '../diagnostics/messages.ts';

export interface DropRecord {
  t_s: readonly number[];
  x_mm: readonly number[];
}

/** One turning point of the free vibration, refined by a local parabola. */
export interface Extremum {
  index: number;
  t_s: number;
  x_mm: number;
}

/** The fitted damped sine x(t) = A e^{-zeta w_n tau} cos(w_d tau + phi) + c, tau = t - start_s. */
export interface DampedSineFit {
  amplitude_mm: number;
  damping_ratio: number;
  natural_frequency_hz: number;
  phase_rad: number;
  offset_mm: number;
  /** Root-mean-square residual over the fitted samples, mm. */
  rms_mm: number;
  iterations: number;
}

export interface FloorTestEstimate {
  mass_kg: number;
  /** From the fit (the whole free-vibration part, least squares). */
  natural_frequency_hz: number;
  damping_ratio: number;
  /** k = M (2 pi f_n)^2 with f_n from the fit, N/mm. */
  stiffness_N_per_mm: number;
  damping_ratio_log_decrement: number;
  damping_ratio_fit: number;
  /** From the spacing of the turning points. */
  damped_frequency_hz: number;
  /** Standard deviation of the measurement noise, from second differences, mm. */
  noise_mm: number;
  free_vibration: { start_s: number; end_s: number; samples: number; half_cycles: number };
  extrema: Extremum[];
  fit: DampedSineFit;
  /** Cautions about this record (estimates that disagree, few cycles). */
  notes: string[];
}

/** A record the estimator cannot use; the message says why. */
export class FloorTestError extends Error {
  readonly code: number;
  constructor(key: MessageKey, params: Record<string, string | number>) {
    const { code, text } = say(key, params);
    super(text);
    this.code = code;
    this.name = 'FloorTestError';
  }
}
