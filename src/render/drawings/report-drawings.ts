import type { BuildScene } from '../../core/result/build-scene.ts';
import type { Drawing } from './drawing.ts';
import { floorTension } from './floor-tension.ts';
import { planTurn } from './plan-turn.ts';
import { sideElevation } from './side-elevation.ts';

/** The report's drawings of the build, side elevation first (the report's first page shows it). */
export function reportDrawings(a: BuildScene): Drawing[] {
  return [sideElevation(a), planTurn(a), floorTension(a)];
}
