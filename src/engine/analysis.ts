import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from '../result/check-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { loadCases } from '../model/load-cases.ts';
import { massModel, type MassModel } from '../model/mass-model.ts';
import { memberCases, type MemberCase } from '../model/member-cases.ts';
import { turnModel, type TurnModel } from '../model/turn.ts';
import { lashingDemands, type Joint, type JointDemand } from '../model/lashing-demand.ts';
import { floorModel, type FloorModel } from '../model/cable-net/floor-model.ts';
import { loadFactor } from '../model/load-factors.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import type { CuttingResult } from '../cutlist/cutting-result.ts';
import { cuttingResult } from '../cutlist/cutting-model.ts';

/** Models computed at most once per check, on first use by any rule. */
export class Analysis {
  #mass?: MassModel;
  #cases?: LoadCaseResult[];
  #turn?: TurnModel;
  #lashingDemands?: Record<Joint, JointDemand>;
  #floorStatic?: FloorModel;
  #floorBump?: FloorModel;
  #memberCases?: MemberCase[];
  #cutting?: CuttingResult;
  constructor(
    readonly spec: CheckedSpecification,
    readonly data: RulesData,
    /** The LP solver for the stock plan, loaded at the edge; without it the plan is first-fit decreasing. */
    readonly lp?: LpSolver,
  ) {}
  get mass(): MassModel {
    return (this.#mass ??= massModel(this.spec, this.data));
  }
  get loadCases(): LoadCaseResult[] {
    return (this.#cases ??= loadCases(this.spec, this.data));
  }
  /** The static case with the crew as placed. */
  get staticCase(): LoadCaseResult {
    return this.loadCases.find((c) => c.id === 'static')!;
  }
  /** The design turn at the design speed, crew as placed. */
  get turn(): TurnModel {
    return (this.#turn ??= turnModel(this.spec, this.data, this.mass, this.staticCase.axle_load_N));
  }
  /** The strap floor under the crew's weight alone (factor 1). */
  get floorStatic(): FloorModel {
    return (this.#floorStatic ??= floorModel(this.spec, this.data, { value: 1, source: 'the crew standing, no dynamic factor' }));
  }
  /** The strap floor under the crew's weight times the bump dynamic factor. */
  get floorBump(): FloorModel {
    const f = loadFactor(this.data, 'bump_dynamic_factor');
    return (this.#floorBump ??= floorModel(this.spec, this.data, { value: f.value, source: `bump_dynamic_factor, rules/limits/load-cases.yaml: ${f.source}` }));
  }
  /** The load cases the timber members are checked in, with their load-duration classes. */
  get memberCases(): MemberCase[] {
    return (this.#memberCases ??= memberCases(this.spec, this.data, this.mass, this.loadCases, this.turn));
  }
  /** Cut list, leather list, wheel setting-out and stock plan. */
  get cutting(): CuttingResult {
    return (this.#cutting ??= cuttingResult(this.spec, this.data, this.mass.layout, this.lp));
  }
  /** The force each lashed joint must pass, case by case. */
  get lashingDemands(): Record<Joint, JointDemand> {
    return (this.#lashingDemands ??= lashingDemands({ spec: this.spec, data: this.data, mass: this.mass, cases: this.loadCases, turn: this.turn, floorBump: this.floorBump }));
  }
}
