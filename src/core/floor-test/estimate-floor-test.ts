// The floor's natural frequency, damping and stiffness from a drop record.
//
// Method:
// 1. Noise: the standard deviation from the second differences (noise-level.ts).
// 2. First peak: the sample farthest from the record's starting level (the
//    median of its first samples); the free vibration starts there. Before it
//    lies the drop and the impact. A floor held and let go (release.ts) starts
//    instead at the first turning point after the release, the hold's level
//    taking the place of the starting level.
// 3. Rough half period: turning points of the raw record with a band of a
//    tenth of the first peak's excursion.
// 4. Turning points again on the record smoothed over a sixteenth of a period,
//    with a band of 8 noise deviations of the smoothed record; each refined by
//    a parabola through the raw samples within a twelfth of a period.
// 5. The free vibration ends at the last turning point whose half-cycle height
//    is still at least 10 noise deviations: below that the oscillation is lost
//    in the noise.
// 6. Damping by logarithmic decrement over those turning points
//    (log-decrement.ts), and by a least-squares damped-sine fit over the same
//    samples (damped-sine-fit.ts), started from the decrement's numbers.
// 7. f_n and zeta reported from the fit; k = M (2 pi f_n)^2.

import { fitDampedSine } from './damped-sine-fit.ts';
import { FloorTestError, type DampedSineFit, type DropRecord, type Extremum, type FloorTestEstimate } from './floor-test-types.ts';
import { logDecrement } from './log-decrement.ts';
import { findRelease } from './release.ts';
import { median, noiseLevel } from './noise-level.ts';
import { movingAverage, refineExtremum, turningPoints } from './turning-points.ts';

/** Half-cycle heights kept while at least this many noise deviations. */
export const HEIGHT_OVER_NOISE = 10;
/** Fewest half-cycle heights for a decrement: three ratios of successive heights. */
export const MIN_HALF_CYCLES = 4;
/** The two damping estimates are said to disagree beyond this relative difference. */
const DISAGREE = 0.15;

export function estimateFloorTest(record: DropRecord, mass_kg: number): FloorTestEstimate {
  if (!(mass_kg > 0) || !Number.isFinite(mass_kg)) throw new FloorTestError('floorTestMass', { value: String(mass_kg) });
  const { t_s: t, x_mm: x } = record;
  const noise = noiseLevel(x);
  const level = median(x.slice(0, Math.max(3, Math.floor(x.length / 50))));
  // A held floor let go: the level before the free vibration is the hold's, and the fit starts after the release.
  // Where the hold is where the record starts, both ways find the same first peak.
  const held = findRelease(t, x, noise);
  const release = held && held.peak !== farthestFrom(x, level) ? held : null;
  const start = release ? release.level_mm : level;
  const peak = release ? release.peak : farthestFrom(x, start);
  const excursion = Math.abs(x[peak] - start);
  if (!(excursion > HEIGHT_OVER_NOISE * noise) || excursion === 0) throw new FloorTestError('floorTestStill', { noise: noise.toFixed(3) });
  // Work on y with the first peak a maximum; the sign goes back at the end.
  const sign = x[peak] > start ? 1 : -1;
  const y = x.map((v) => sign * v);
  const dt = (t[t.length - 1] - t[0]) / (t.length - 1);

  const rough = turningPoints(y, peak, excursion / 10);
  const fewCycles = (count: number) =>
    new FloorTestError('floorTestFewCycles', { time: t[peak].toFixed(3), count, noise: noise.toFixed(3), min: MIN_HALF_CYCLES });
  if (rough.length < 3) throw fewCycles(Math.max(0, rough.length - 1));
  const halfPeriod = median(rough.slice(1, 6).map((k, i) => t[k] - t[rough[i]]));

  const width = 2 * Math.floor(halfPeriod / 8 / dt / 2) + 1;
  const smooth = movingAverage(y, width);
  const band = (8 * noise) / Math.sqrt(width);
  const points = turningPoints(smooth, peak, band).map((k) => refineExtremum(t, y, k, halfPeriod / 6));
  const kept = aboveNoise(points, HEIGHT_OVER_NOISE * noise);
  if (kept.length - 1 < MIN_HALF_CYCLES) throw fewCycles(kept.length - 1);

  const dec = logDecrement(kept);
  if (!(dec.delta > 0)) throw new FloorTestError('floorTestFit', { reason: 'the half-cycle heights do not die away: the record is not the free vibration of a damped floor' });
  const first = kept[0];
  const last = kept[kept.length - 1];
  const segment = { from: peak, to: last.index };
  const tau = t.slice(segment.from, segment.to + 1).map((v) => v - t[peak]);
  const xs = x.slice(segment.from, segment.to + 1);
  const zeta0 = Math.min(Math.max(dec.damping_ratio, 1e-4), 0.8);
  const phi0 = -Math.asin(zeta0);
  const q = Math.exp(-dec.delta / 2);
  const h0 = dec.heights_mm[0] / (1 + q);
  const fd = 1 / dec.damped_period_s;
  const fit = fitOrRefuse(tau, xs, {
    amplitude_mm: (sign * h0) / Math.cos(phi0),
    damping_ratio: zeta0,
    natural_frequency_hz: fd / Math.sqrt(1 - zeta0 ** 2),
    phase_rad: phi0 + phaseAtPeak(first, t[peak], fd),
    offset_mm: sign * (first.x_mm - h0),
  });
  if (!Number.isFinite(fit.rms_mm) || fit.rms_mm > 0.5 * h0) {
    throw new FloorTestError('floorTestFit', { reason: `residual ${fit.rms_mm.toFixed(3)} mm against a first amplitude of ${h0.toFixed(3)} mm` });
  }

  const wn = 2 * Math.PI * fit.natural_frequency_hz;
  const extrema = kept.map((e) => ({ ...e, x_mm: sign * e.x_mm }));
  return {
    mass_kg,
    natural_frequency_hz: fit.natural_frequency_hz,
    damping_ratio: fit.damping_ratio,
    stiffness_N_per_mm: (mass_kg * wn * wn) / 1000,
    damping_ratio_log_decrement: dec.damping_ratio,
    damping_ratio_fit: fit.damping_ratio,
    damped_frequency_hz: fd,
    noise_mm: noise,
    free_vibration: { start_s: t[segment.from], end_s: t[segment.to], samples: xs.length, half_cycles: kept.length - 1 },
    extrema,
    fit,
    notes: [...(release ? [releaseNote(t[release.index], release.level_mm, t[peak])] : []), ...notes(dec.damping_ratio, fit.damping_ratio, kept.length - 1)],
  };
}

/** The fit, or the record refused where the least-squares steps cannot be solved (a record far from a damped sine). */
function fitOrRefuse(...args: Parameters<typeof fitDampedSine>): DampedSineFit {
  try {
    return fitDampedSine(...args);
  } catch (e) {
    throw new FloorTestError('floorTestFit', { reason: `its least-squares step could not be solved: ${(e as Error).message}` });
  }
}

function releaseNote(at_s: number, level_mm: number, peak_s: number): string {
  return `The floor was held at ${level_mm.toFixed(3)} mm and let go at ${at_s.toFixed(3)} s (a release, not a drop): the free vibration is read from the first turning point after it, at ${peak_s.toFixed(3)} s.`;
}

function farthestFrom(x: readonly number[], level: number): number {
  let best = 0;
  x.forEach((v, i) => {
    if (Math.abs(v - level) > Math.abs(x[best] - level)) best = i;
  });
  return best;
}

/** Turning points up to the last whose half-cycle height is at least `minHeight`. */
function aboveNoise(points: readonly Extremum[], minHeight: number): Extremum[] {
  let end = 1;
  while (end < points.length && Math.abs(points[end].x_mm - points[end - 1].x_mm) >= minHeight) end++;
  return points.slice(0, end);
}

/** The refined first turning point may fall between samples: the phase at the peak sample's time. */
function phaseAtPeak(first: Extremum, tPeak: number, fd: number): number {
  return -2 * Math.PI * fd * (first.t_s - tPeak);
}

function notes(zLog: number, zFit: number, halfCycles: number): string[] {
  const out: string[] = [];
  if (Math.abs(zLog - zFit) > DISAGREE * Math.max(zLog, zFit)) {
    out.push(
      `The two damping estimates differ by more than ${DISAGREE * 100} % (log decrement ${zLog.toFixed(4)}, fit ${zFit.toFixed(4)}): the floor may not be linear (friction in the weave, stiffening under load) or the mass may have left the floor.`,
    );
  }
  if (halfCycles < 2 * MIN_HALF_CYCLES) out.push(`Only ${halfCycles} half-cycles stand above the noise; the damping is uncertain.`);
  return out;
}
