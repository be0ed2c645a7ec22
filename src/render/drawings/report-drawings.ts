import type { BuildScene } from '../../core/result/build-scene.ts';
import type { Drawing } from './drawing.ts';
import { floorTension } from './floor-tension.ts';
import { planTurn } from './plan-turn.ts';
import { sideElevation } from './side-elevation.ts';

/** The report's drawings of the build, side elevation first (the report's first page shows it); `scales` draws each named one at that scale or coarser. */
export function reportDrawings(a: BuildScene, scales: Readonly<Record<string, number>> = {}): Drawing[] {
  return [sideElevation(a, scales['side-elevation']), planTurn(a, scales['plan-turn']), floorTension(a, scales['floor-straps'])];
}
