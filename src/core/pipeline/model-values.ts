import type { WheelStiffness } from '../model/wheel/wheel-stiffness.ts';
import type { CuttingResult } from '../cutlist/cutting-result.ts';
import type { LoadEntry } from '../loads/load-entry.ts';
import type { PlotData } from '../plots/plot-data.ts';
import type { BuildScene } from '../result/build-scene.ts';
import type { FigureEntry } from '../result/figure.ts';
import type { FloorModel, FloorSetup } from '../model/cable-net/floor-model.ts';
import type { JointDemand, Joint } from '../model/lashing-demand.ts';
import type { LoadCaseResult } from '../model/load-case-result.ts';
import type { MassModel } from '../model/mass-model.ts';
import type { MemberCase } from '../model/member-cases.ts';
import type { LoadPosition } from '../model/wheel/wheel-ring-scan.ts';
import type { WheelRingSpec } from '../model/wheel/wheel-ring-spec.ts';
import type { TurnModel } from '../model/turn.ts';
import type { DampingNeeded } from '../ride/damping-tuner.ts';
import type { GroundFactors } from '../ride/dynamic-factors.ts';
import type { RideInput } from '../ride/ride-build.ts';
import type { RideCase, RideResult } from '../ride/ride-types.ts';
import type { HorseMass } from '../model/horse-mass.ts';
import type { Draught } from '../model/draught.ts';

/** One ground's dynamic factors: the crew's for the floor and lashings, the wheels' for the members, the yoke's rise for the pole; provisional where the data's bound stands in. */
export type BumpFactors = GroundFactors;

/** Every model of a check by id, with what it gives. Models and rules name the ones they read. */
export interface ModelValues {
  mass: MassModel;
  loadCases: LoadCaseResult[];
  /** The static case with the crew as placed. */
  staticCase: LoadCaseResult;
  /** The design turn at the design speed, crew as placed. */
  turn: TurnModel;
  /** The strap net, its frame and the frame's flexibility, shared by every floor state. */
  floorSetup: FloorSetup;
  /** The strap floor under the crew's weight alone (factor 1). */
  floorStatic: FloorModel;
  /** The wheel's own radial stiffness from its ring frame (rolling and striking). */
  wheelStiffness: WheelStiffness;
  /** What the ride model reads from the other models. */
  rideInput: RideInput;
  /** The ride model's cases (rough ground and the stone, each under both wheels and one; the drop test); null where it is not run (no crew, or a statics-only run). */
  ride: Record<RideCase, RideResult> | null;
  /** The ride model's cases over routine rough ground (both wheels, one wheel); null where it is not run. */
  rideRough: Partial<Record<RideCase, RideResult>> | null;
  /** The ride model's cases over the stone (both wheels, one wheel); null where it is not run. */
  rideStone: Partial<Record<RideCase, RideResult>> | null;
  /** The ride model's drop test; null where it is not run. */
  rideDrop: Partial<Record<RideCase, RideResult>> | null;
  /** The least floor damping ratio that meets the ride rules (the tuner); null where the ride model is not run. */
  floorDampingNeeded: DampingNeeded | null;
  /** Routine rough ground's dynamic factors (operation.rough_ground), from the ride model or, provisional, the data's routine_factor_bound. */
  bumpFactors: BumpFactors;
  /** The stone strike's dynamic factors (operation.bump_height_mm, bump_length_mm), from the ride model or, provisional, the data's stone_factor_bound. */
  stoneFactors: BumpFactors;
  /** The four loaded floor states solved together (the next four models each pick one). */
  floorLoaded: { bump: FloorModel; stone: FloorModel; design: FloorModel; designRough: FloorModel };
  /** The strap floor under the crew's weight times the routine rough ground's factor (characteristic). */
  floorBump: FloorModel;
  /** The strap floor under the crew's weight times the stone's factor (accidental: every action × 1.0). */
  floorStone: FloorModel;
  /** The strap floor in the fundamental combination, the crew standing: their weight × γ_Q. */
  floorDesign: FloorModel;
  /** The strap floor in the fundamental combination over rough ground: the crew's weight × φ_routine × γ_Q. */
  floorDesignRough: FloorModel;
  /** The load cases the timber members are checked in, with their load-duration classes. */
  memberCases: MemberCase[];
  /** The wheel's ring at every contact position, one list per member case (scanWheelRing). */
  wheelRingScan: { ws: WheelRingSpec; scans: LoadPosition[][] };
  /** Cut list, leather list, wheel setting-out and stock plan. */
  cutting: CuttingResult;
  /** The force each lashed joint must pass, case by case. */
  lashingDemands: Record<Joint, JointDemand>;
  /** The named figures of the result, or for each that does not apply the reason why. */
  figures: Record<string, FigureEntry>;
  /** Every load the models computed, by part and case (the Loads sheet). */
  loads: LoadEntry[];
  /** What the drawings of the build are made from. */
  scene: BuildScene;
  /** The balance and turn plots as data. */
  plots: PlotData[];
  /** The lightest horse's mass: as given, by tape, or the low end of a preset band. */
  horse: HorseMass;
  /** The pull up the design grade and the team's sustained and short pulls. */
  draught: Draught;
}

export type ModelId = keyof ModelValues;
