import { formatNumber } from '../format/number-format.ts';
import { figureOrReason, type FigureEntry } from '../result/figure.ts';
import type { DampingNeeded } from './damping-tuner.ts';

// The figure floor_damping_ratio_needed: the tuner's least floor damping
// ratio, or why there is none. The tuner runs only where ride.decay finds the
// crew's motion dies out too slowly, so most checks leave it out.

export function dampingFigure(d: DampingNeeded | null): FigureEntry {
  if (d === null) return { not_applicable: "the floor-damping tuner did not run: it runs only where ride.decay finds the crew's motion dies out too slowly" };
  return figureOrReason(d.ratio, '1', `no floor damping ratio up to ${formatNumber(d.bounds[1])} keeps the crew on the floor over rough ground and their motion within the decay rule's cycles`);
}
