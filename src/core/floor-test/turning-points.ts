// Turning points of an oscillation, found with a hysteresis band so that
// noise alone cannot make one: a maximum is taken once the signal has fallen
// the band below it, a minimum once it has risen the band above it.

import type { Extremum } from './floor-test-types.ts';

/**
 * Alternating turning points of y from index `from` on, `from` being a maximum.
 * Returns their indices, `from` first.
 */
export function turningPoints(y: readonly number[], from: number, band: number): number[] {
  const found = [from];
  let lookingForMax = false;
  let best = from;
  for (let i = from + 1; i < y.length; i++) {
    if (lookingForMax ? y[i] > y[best] : y[i] < y[best]) best = i;
    const moved = lookingForMax ? y[best] - y[i] : y[i] - y[best];
    if (moved > band) {
      found.push(best);
      lookingForMax = !lookingForMax;
      best = i;
    }
  }
  return found;
}

/** Centred moving average over `width` samples (odd), shortened at the ends. */
export function movingAverage(y: readonly number[], width: number): number[] {
  const half = Math.max(0, Math.floor(width / 2));
  const prefix = [0];
  for (const v of y) prefix.push(prefix[prefix.length - 1] + v);
  return y.map((_, i) => {
    const lo = Math.max(0, i - half);
    const hi = Math.min(y.length - 1, i + half);
    return (prefix[hi + 1] - prefix[lo]) / (hi - lo + 1);
  });
}

/**
 * The turning point near sample `index`, refined by a least-squares parabola
 * through the raw samples within `halfWidth_s` of it: the noise averages out
 * and the top falls between samples. Kept at the sample if the parabola does
 * not turn inside the window.
 */
export function refineExtremum(t: readonly number[], x: readonly number[], index: number, halfWidth_s: number): Extremum {
  const t0 = t[index];
  let lo = index;
  let hi = index;
  while (lo > 0 && t0 - t[lo - 1] <= halfWidth_s) lo--;
  while (hi < t.length - 1 && t[hi + 1] - t0 <= halfWidth_s) hi++;
  lo = Math.max(0, Math.min(lo, index - 2));
  hi = Math.min(t.length - 1, Math.max(hi, index + 2));
  const fallback = { index, t_s: t0, x_mm: x[index] };
  if (hi - lo < 2) return fallback;
  // Time scaled to the window keeps the normal equations well conditioned.
  const scale = Math.max(t[hi] - t0, t0 - t[lo]);
  const p = parabola(t.slice(lo, hi + 1).map((v) => (v - t0) / scale), x.slice(lo, hi + 1));
  if (p === null || p.c === 0) return fallback;
  const at = -p.b / (2 * p.c);
  if (at < (t[lo] - t0) / scale || at > (t[hi] - t0) / scale) return fallback;
  return { index, t_s: t0 + at * scale, x_mm: p.a + p.b * at + p.c * at * at };
}

/** Least-squares y = a + b s + c s^2 by the normal equations (3 x 3, Cramer's rule). */
function parabola(s: readonly number[], y: readonly number[]): { a: number; b: number; c: number } | null {
  const S = [0, 0, 0, 0, 0];
  const T = [0, 0, 0];
  s.forEach((v, i) => {
    let p = 1;
    for (let k = 0; k < 5; k++) {
      S[k] += p;
      if (k < 3) T[k] += p * y[i];
      p *= v;
    }
  });
  const m = [
    [S[0], S[1], S[2]],
    [S[1], S[2], S[3]],
    [S[2], S[3], S[4]],
  ];
  const det = det3(m);
  if (Math.abs(det) < 1e-12 * Math.abs(S[0] * S[2] * S[4])) return null;
  const solve = (col: number) => det3(m.map((row, r) => row.map((v, c) => (c === col ? T[r] : v)))) / det;
  return { a: solve(0), b: solve(1), c: solve(2) };
}

function det3(m: number[][]): number {
  return (
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0])
  );
}
