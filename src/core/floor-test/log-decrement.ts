// Logarithmic decrement over successive turning points. For a damped sine the
// turning points are half a damped period apart and each half-cycle height
// (one turning point to the next) is the one before times
// q = exp(-delta / 2), whatever the rest position; so the heights need no
// estimate of where the floor settles.

import type { Extremum } from './floor-test-types.ts';

export interface DecrementEstimate {
  /** Logarithmic decrement per full cycle. */
  delta: number;
  damping_ratio: number;
  /** Damped period from the spacing of the turning points, s. */
  damped_period_s: number;
  /** Half-cycle heights, mm. */
  heights_mm: number[];
}

/** Least-squares slopes of ln(height) and of time against the half-cycle count. */
export function logDecrement(extrema: readonly Extremum[]): DecrementEstimate {
  const heights = extrema.slice(1).map((e, i) => Math.abs(e.x_mm - extrema[i].x_mm));
  const perHalf = slope(heights.map(Math.log));
  const delta = -2 * perHalf;
  return {
    delta,
    damping_ratio: dampingFromDecrement(delta),
    damped_period_s: 2 * slope(extrema.map((e) => e.t_s)),
    heights_mm: heights,
  };
}

/** zeta = delta / sqrt(4 pi^2 + delta^2), the exact inverse of delta = 2 pi zeta / sqrt(1 - zeta^2). */
export function dampingFromDecrement(delta: number): number {
  return delta / Math.sqrt(4 * Math.PI * Math.PI + delta * delta);
}

/** Slope of the least-squares line through (i, y_i). */
function slope(y: readonly number[]): number {
  const n = y.length;
  const iMean = (n - 1) / 2;
  const yMean = y.reduce((a, b) => a + b, 0) / n;
  let num = 0;
  let den = 0;
  y.forEach((v, i) => {
    num += (i - iMean) * (v - yMean);
    den += (i - iMean) ** 2;
  });
  return num / den;
}
