// Where the free vibration of a record starts when the floor was held and let
// go (a pluck, or a load set down without a drop): the record sits still on a
// held level, a step away from where the floor comes to rest, then rings. The
// held level need not be where the record starts (the floor may be pulled down
// after the record begins), so the start of the record does not show it.
//
// Method: turning points of the whole record with a band of a tenth of its
// largest excursion from the final rest level (the median of its last tenth).
// A free vibration is a run of turning points on alternate sides of the rest
// level whose distance from it does not grow, starting with a swing of at
// least half the largest. Where the first point of the
// longest such run sits on a hold (the record stays within the band of its
// level for longer than a sine's peak would, 0.6 of a half period against
// about 0.3), the floor was released at the end of that hold, and the free
// vibration is read from the first turning point after it: the release itself
// is a turning point whose exact moment a held record blurs.

import { median } from './noise-level.ts';

export interface Release {
  /** The last sample of the hold: the floor let go here. */
  index: number;
  /** The held level, mm. */
  level_mm: number;
  /** The first turning point after the release, where the fit starts. */
  peak: number;
}

/** Band of the rough turning points, as a fraction of the largest excursion from rest. */
const BAND = 0.1;
/** A run's point held within the band for longer than this many half periods sits on a hold. */
const HOLD = 0.6;
/** Distance from rest a run's point keeps, as a fraction of the band (nearer is neither side). */
const SIDE = 0.25;
/** A run starts at least this fraction of the largest excursion from rest. */
const START = 0.5;
/** Growth allowed between successive points of a run (noise on the extremes). */
const GROWTH = 1.05;

/** Alternating turning points of x from the first sample, whichever way it moves first. */
export function turningPointsFromStart(x: readonly number[], band: number): number[] {
  const found: number[] = [];
  let hi = 0;
  let lo = 0;
  let dir = 0; // 1: looking for a maximum, -1: a minimum, 0: not yet moved by the band
  let best = 0;
  for (let i = 1; i < x.length; i++) {
    if (dir === 0) {
      if (x[i] > x[hi]) hi = i;
      if (x[i] < x[lo]) lo = i;
      if (x[hi] - x[i] > band) [found[0], dir, best] = [hi, -1, i];
      else if (x[i] - x[lo] > band) [found[0], dir, best] = [lo, 1, i];
      continue;
    }
    if (dir > 0 ? x[i] > x[best] : x[i] < x[best]) best = i;
    if (dir * (x[best] - x[i]) > band) {
      found.push(best);
      dir = -dir;
      best = i;
    }
  }
  return found;
}

/** The release of a held floor, or null where the record shows none (a drop, or a record that starts ringing). */
export function findRelease(t: readonly number[], x: readonly number[], noise: number): Release | null {
  const n = x.length;
  const rest = median(x.slice(n - Math.max(3, Math.floor(n / 10))));
  let reach = 0;
  for (const v of x) reach = Math.max(reach, Math.abs(v - rest));
  const band = Math.max(BAND * reach, 4 * noise);
  const points = turningPointsFromStart(x, band);
  const run = longestRun(points, x, rest, band, reach);
  if (run === null || run.length < 4) return null;
  const [p0, p1] = run;
  // The half period from the run after its first point (which may include the hold).
  const halves: number[] = [];
  for (let i = 1; i + 1 < run.length && i <= 5; i++) halves.push(t[run[i + 1]] - t[run[i]]);
  const halfPeriod = median(halves);
  // The stretch round p0 that stays within the band of its level.
  let lo = p0;
  let hi = p0;
  while (lo > 0 && Math.abs(x[lo - 1] - x[p0]) <= band) lo--;
  while (hi < p1 && Math.abs(x[hi + 1] - x[p0]) <= band) hi++;
  if (t[hi] - t[lo] <= HOLD * halfPeriod) return null;
  // Let go at the last sample still at the held level, within the noise (the band reaches into the first swing).
  const level = median(x.slice(lo, hi + 1));
  let index = hi;
  while (index > lo && Math.abs(x[index] - level) > Math.max(4 * noise, band / 10)) index--;
  return { index, level_mm: level, peak: p1 };
}

/**
 * The longest run of turning points on alternate sides of rest, none farther
 * from it than the one before, starting at least half the largest excursion
 * from rest (a free vibration starts with its largest swing; the noise at rest
 * makes runs of its own).
 */
function longestRun(points: readonly number[], x: readonly number[], rest: number, band: number, reach: number): number[] | null {
  let best: number[] | null = null;
  let cur: number[] = [];
  const side = (k: number) => Math.sign(x[k] - rest);
  const far = (k: number) => Math.abs(x[k] - rest);
  for (const k of points) {
    const last = cur[cur.length - 1];
    const fits = far(k) >= SIDE * band && (last === undefined || (side(k) !== side(last) && far(k) <= GROWTH * far(last)));
    if (fits) cur.push(k);
    else cur = far(k) >= SIDE * band ? [k] : [];
    if (far(cur[0]) >= START * reach && (!best || cur.length > best.length)) best = [...cur];
  }
  return best && best.length ? best : null;
}
