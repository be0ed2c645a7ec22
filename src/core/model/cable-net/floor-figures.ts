import type { ModelView } from '../../pipeline/define-model.ts';
import { figureOrReason, type FigureEntry } from '../../result/figure.ts';
import type { FloorModel } from './floor-model.ts';

// The strap floor's named figures, each a number or the reason it does not
// apply (a floor that was not solved: floor.convergence says why).
export function floorFigures(a: ModelView<'floorStatic' | 'floorBump' | 'floorStone'>): Record<string, FigureEntry> {
  const stat = a.floorStatic;
  const loaded = [stat, a.floorBump, a.floorStone];
  const unsolved = 'the floor model did not settle (floor.convergence says why)';
  const solved = (v: number, unit: string, ms: readonly FloorModel[] = [stat]) => figureOrReason(ms.every((m) => m.converged) ? v : null, unit, unsolved);
  const clearance = floorClearanceMin(loaded);
  return {
    strap_tension_static_max: solved(stat.maxTension_N, 'N'),
    strap_tension_max: solved(Math.max(...loaded.map((m) => m.maxTension_N)), 'N', loaded),
    floor_sag_static_max: solved(Math.max(...stat.crew.map((c) => c.sag_mm)), 'mm'),
    floor_stiffness: figureOrReason(stat.converged ? stat.crew[0]?.tangentStiffness_N_per_mm : null, 'N/mm', stat.crew.length ? unsolved : 'no crew aboard'),
    floor_clearance_min: figureOrReason(clearance, 'mm', loaded.some((m) => !m.converged) ? unsolved : 'no pole or axle lies under the floor'),
  };
}

/**
 * The least clearance left between the sagging floor and the top of any part
 * beneath it (pole, axle) in any of the cases given (standing, rough ground,
 * the stone), mm; null where no part lies under the floor or a case was not solved.
 */
export function floorClearanceMin(cases: readonly FloorModel[]): number | null {
  if (cases.some((m) => !m.converged)) return null;
  const left = cases.flatMap((m) => m.clearances.map((c) => c.clearance_mm - c.sag_mm));
  return left.length ? Math.min(...left) : null;
}
