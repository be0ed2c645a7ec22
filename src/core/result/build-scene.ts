import type { Layout } from '../model/layout.ts';
import type { StrapTension } from '../model/cable-net/floor-results.ts';
import type { TurnModel } from '../model/turn.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LoadCaseResult } from '../model/load-case-result.ts';

/**
 * What the drawings of the build are made from: the checked specification
 * and the few model results they show, as plain data, so the render layer
 * draws them without running a model and anyone can draw them again from
 * result.json.
 */
export interface BuildScene {
  spec: CheckedSpecification;
  layout: Layout;
  /** The rolling assembly's centre of mass with the crew as placed, mm. */
  rolling: { mass_kg: number; x_mm: number; z_mm: number };
  static_case: LoadCaseResult;
  turn: TurnModel;
  /** The strap floor under the crew standing: each strap's largest tension. */
  floor: { converged: boolean; stopped?: string; maxTension_N: number; maxTensionAt: string; straps: StrapTension[] };
}
