import { fromLargest, type TurningPoint } from './decay.ts';

// The decay rule's verdict as a number that moves continuously with the
// damping, for the floor-damping tuner's search. The rule's own measure
// (decay.ts) takes the first turning point k below the fraction T of the
// largest, interpolates the crossing on the logarithm between turning points
// k − 1 and k, and divides by the period measured over k: where k changes, the
// period is measured over another span, so the cycles jump and a secant on
// them cannot settle. Its verdict is the same as this, with K the last turning
// point (counted from the largest) whose cycles cannot exceed the allowance M,
// K = ⌊2M⌋ half cycles on:
// - some turning point up to K falls below T: the motion is within M cycles
//   whatever the period; measured by ln(smallest of them / T) over the
//   needed decrement per half cycle, ln(1/f)/2M, continuous in the damping;
// - else it holds only if turning point K + 1 is below T and the rule's
//   cycles over K, K + 1 are within M: measured by those cycles over M, less
//   one, with the interpolation carried on beyond the pair (continuous).
// The lesser of the two is at most zero exactly where the rule holds (a
// crossing beyond K + 1 gives at least M + ½ cycles: it fails either way).
// Scaled to the allowance, it reads as the fraction by which the decrement
// falls short of the one needed: positive fails.

/** Half cycles after the largest turning point the shortfall needs: K + 1. */
export const turningPointsNeeded = (maxCycles: number) => Math.floor(2 * maxCycles) + 1;

/**
 * The decay's shortfall on one crew member's turning points: at most zero
 * where the decay rule holds on them, continuous in the damping; NaN where no
 * turning point follows the largest.
 */
export function decayShortfall(points: readonly TurningPoint[], fraction: number, maxCycles: number, after = -Infinity): number {
  const list = fromLargest(points, after);
  const K = Math.floor(2 * maxCycles);
  if (list.length < 2) return NaN;
  const target = fraction * Math.abs(list[0].z);
  const perHalfCycle = Math.log(1 / fraction) / (2 * maxCycles);
  let least = Infinity;
  for (let k = 1; k <= Math.min(K, list.length - 1); k++) least = Math.min(least, Math.abs(list[k].z));
  const within = Math.log(least / target) / perHalfCycle / (2 * maxCycles);
  if (list.length <= K + 1) return within;
  const [a, b] = [list[K], list[K + 1]];
  const [za, zb] = [Math.abs(a.z), Math.abs(b.z)];
  if (!(zb < za)) return within;
  const s = Math.log(za / target) / Math.log(za / zb);
  const period = (2 * (b.t - list[0].t)) / (K + 1);
  const cycles = (a.t + s * (b.t - a.t) - list[0].t) / period;
  return Math.min(within, cycles / maxCycles - 1);
}
