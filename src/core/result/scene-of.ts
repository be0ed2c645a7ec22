import type { ModelView } from '../pipeline/define-model.ts';
import type { BuildScene } from './build-scene.ts';

/** The drawings' data from the models of one check. */
export function buildScene(a: ModelView<'floorStatic' | 'mass' | 'staticCase' | 'turn'>): BuildScene {
  const f = a.floorStatic;
  const { mass_kg, x_mm, z_mm } = a.mass.rolling;
  return {
    spec: a.spec,
    layout: a.mass.layout,
    rolling: { mass_kg, x_mm, z_mm },
    static_case: a.staticCase,
    turn: a.turn,
    floor: { converged: f.converged, ...(f.stopped ? { stopped: f.stopped } : {}), maxTension_N: f.maxTension_N, maxTensionAt: f.maxTensionAt, straps: f.straps },
  };
}
