import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from '../model/load-case-result.ts';
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
import type { RideCase, RideResult } from '../ride/ride-types.ts';
import { rideCases } from '../ride/ride-model.ts';
import type { RideInput } from '../ride/ride-build.ts';
import { floorDampingNeeded, type DampingNeeded } from '../ride/damping-tuner.ts';
import { crewFloorFactor, wheelFactor, yokeIncrease, type DynamicFactor } from '../ride/dynamic-factors.ts';

/** The bump case's factors: the crew's for the floor and lashings, the wheels' for the members. */
export interface BumpFactors {
  crew: DynamicFactor;
  wheel: DynamicFactor;
  /** The ride model's largest yoke force above the standing one, N; null without a ride. */
  yokeIncrease_N: number | null;
}

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
  #ride?: Record<RideCase, RideResult>;
  #dampingNeeded?: DampingNeeded;
  #bumpFactors?: BumpFactors;
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
  /** The strap floor under the crew's weight times the bump factor (the ride model's crew floor factor). */
  get floorBump(): FloorModel {
    return (this.#floorBump ??= floorModel(this.spec, this.data, this.bumpFactors.crew));
  }
  /** The ride model's three cases (ridge, one wheel, drop test), run once. */
  get ride(): Record<RideCase, RideResult> {
    return (this.#ride ??= rideCases(rideInput(this)));
  }
  /** The least floor damping ratio that meets the ride rules (the tuner). */
  get floorDampingNeeded(): DampingNeeded {
    return (this.#dampingNeeded ??= floorDampingNeeded(rideInput(this)));
  }
  /** The bump case's dynamic factors from the ride model, with where they came from. */
  get bumpFactors(): BumpFactors {
    if (this.#bumpFactors) return this.#bumpFactors;
    const placeholder = loadFactor(this.data, 'bump_dynamic_factor');
    const rides = this.spec.crew.length > 0 ? this.ride : null;
    return (this.#bumpFactors = { crew: crewFloorFactor(rides, placeholder), wheel: wheelFactor(rides, placeholder), yokeIncrease_N: yokeIncrease(rides)?.value ?? null });
  }
  /** The load cases the timber members are checked in, with their load-duration classes. */
  get memberCases(): MemberCase[] {
    return (this.#memberCases ??= memberCases(this.spec, this.data, this.mass, this.loadCases, this.turn, { factor: this.bumpFactors.wheel, yokeIncrease_N: this.bumpFactors.yokeIncrease_N }));
  }
  /** Cut list, leather list, wheel setting-out and stock plan. */
  get cutting(): CuttingResult {
    return (this.#cutting ??= cuttingResult(this.spec, this.data, this.mass.layout, this.lp));
  }
  /** The force each lashed joint must pass, case by case. */
  get lashingDemands(): Record<Joint, JointDemand> {
    return (this.#lashingDemands ??= lashingDemands({ spec: this.spec, data: this.data, mass: this.mass, cases: this.loadCases, turn: this.turn, floorBump: this.floorBump, bump: this.bumpFactors.crew }));
  }
}

/** What the ride model reads from the other models of a check. */
export const rideInput = (a: Analysis): RideInput => ({ spec: a.spec, data: a.data, mass: a.mass, staticCase: a.staticCase, floorStatic: a.floorStatic });
