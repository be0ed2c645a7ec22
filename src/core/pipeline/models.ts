import { cuttingResult } from '../cutlist/cutting-model.ts';
import { floorModel, floorModels, floorSetup, type FloorModel } from '../model/cable-net/floor-model.ts';
import { lashingDemands } from '../model/lashing-demand.ts';
import { loadCases } from '../model/load-cases.ts';
import { massModel } from '../model/mass-model.ts';
import { memberCases, wheelInput } from '../model/member-cases.ts';
import { wheelStiffness } from '../model/wheel/wheel-stiffness.ts';
import { wheelRingSpec } from '../model/wheel/wheel-ring-spec.ts';
import { scanWheelRing } from '../model/wheel/wheel-ring-scan.ts';
import { turnModel } from '../model/turn.ts';
import { floorDampingNeeded } from '../ride/damping-tuner.ts';
import { groundFactors } from '../ride/dynamic-factors.ts';
import { param } from '../data/param.ts';
import { someRideCases } from '../ride/ride-model.ts';
import { PLOT_SAMPLES } from '../result/ride-summary.ts';
import type { RideInput } from '../ride/ride-build.ts';
import { RIDE_CASES, ROUTINE_CASES, STONE_CASES, type RideCase, type RideResult } from '../ride/ride-types.ts';
import { defineModel, withInputs, type ModelDef, type ModelInputs } from './define-model.ts';
import { COMBINATION_PARAMS } from '../model/combination-factors.ts';
import { designFloorFactor } from '../model/cable-net/design-floor-factor.ts';
import { ROLLING_PARAMS } from '../model/rolling-resistance.ts';
import { figures } from '../figures.ts';
import { collectLoads } from '../loads/collect-loads.ts';
import { reportPlots } from '../plots/report-plots.ts';
import { buildScene } from '../result/scene-of.ts';
import { HORSE_PARAMS, horseMass } from '../model/horse-mass.ts';
import { draught } from '../model/draught.ts';

// Every model of a check, with what it reads. The pipeline computes only the
// models the requested rules and outputs need, each once.

const TIMBER = ['timber-strength.fifth_percentile_z', 'timber-strength.gamma_M'] as const;
/** The floor's solver settings. */
const FLOOR = ['floor.solver.tolerance_fraction', 'floor.solver.max_iterations', 'floor.solver.max_nodes'] as const;
/** The mass of an iron tyre reads steel's density. */
const MASS = ['tyre.iron_density_kg_per_m3'] as const;
/** The balance weighs the chariot and reads the rolling resistance and the EQU factors. */
const BALANCE = [...MASS, ...ROLLING_PARAMS, ...COMBINATION_PARAMS] as const;
/** The 5th-percentile stiffness of a timber part (the pole's bending spring in the ride model). */
const TIMBER_STIFFNESS = ['timber-strength.fifth_percentile_z', 'timber-strength.cov_moe', 'timber-strength.min_moisture_credit_pct'] as const;
/** Everything a run of the ride model reads (the ground's own stiffness and damping follow the specification's ground). */
const RIDE = [
  'ride.inputs.duration_s', 'ride.inputs.sample_interval_s', 'ride.inputs.decay_fraction', 'ride.inputs.rough_ground_height_mm', 'ride.inputs.rough_ground_length_mm',
  'ride.wheel-contact.stiffness_bare', 'ride.wheel-contact.stiffness_tyred', 'ride.wheel-contact.damping_ratio',
  'ride.supports.yoke_pad_stiffness', 'ride.supports.yoke_damping_ratio', 'ride.supports.shear_modulus_ratio', 'ride.supports.legs_stiffness', 'ride.supports.floor_damping_ratio',
  ...TIMBER_STIFFNESS,
  ...ROLLING_PARAMS,
] as const;
const CUTTING = ['bend_end_allowance_mm', 'bend_good_fraction', 'nave_tenon_fraction', 'felloe_tenon_fraction', 'linchpin_diameter_fraction', 'linchpin_length_factor', 'hide_waste_factor'].map((n) => `cutlist.${n}` as const);

export const massDef = defineModel({
  id: 'mass',
  needs: [],
  params: MASS,
  compute: (_, { spec, data }) => massModel(spec, data),
});

export const loadCasesDef = defineModel({
  id: 'loadCases',
  needs: [],
  params: BALANCE,
  compute: (_, { spec, data }) => loadCases(spec, data),
});

export const staticCaseDef = defineModel({
  id: 'staticCase',
  needs: ['loadCases'],
  params: [],
  compute: ({ loadCases }) => {
    const c = loadCases.find((x) => x.id === 'static');
    if (!c) throw new Error('the load cases hold no static case');
    return c;
  },
});

export const turnDef = defineModel({
  id: 'turn',
  needs: ['mass', 'staticCase'],
  params: [],
  compute: ({ mass, staticCase }, { spec, data }) => turnModel(spec, data, mass, staticCase.axle_load_N),
});

/** The strap net, its frame and the frame's flexibility: shared by every floor state, and independent of the crew. */
export const floorSetupDef = defineModel({
  id: 'floorSetup',
  needs: [],
  params: ['floor.solver.max_nodes'],
  compute: (_, { spec, data }) => floorSetup(spec, data),
});

export const floorStaticDef = defineModel({
  id: 'floorStatic',
  needs: ['floorSetup'],
  params: FLOOR,
  compute: ({ floorSetup }, { spec, data, startFrom }) => {
    // A run that varies a check starts from the check's standing floor (floorModels takes it where the net fits).
    const start = (startFrom?.get('floorStatic') as FloorModel | undefined)?.solution;
    return floorModel(spec, data, { value: 1, source: 'the crew standing, no dynamic factor' }, { start }, floorSetup);
  },
});

/** The wheel's own radial stiffness from its ring frame, rolling (averaged round the rim) and striking (its stiffest). */
export const wheelStiffnessDef = defineModel({
  id: 'wheelStiffness',
  needs: ['mass', 'staticCase'],
  params: TIMBER_STIFFNESS, // the felloe's and spokes' moduli
  compute: ({ mass, staticCase }, { spec, data }) => wheelStiffness(wheelRingSpec(spec, data, mass.layout), staticCase.axle_load_N / 2),
});

export const rideInputDef = defineModel({
  id: 'rideInput',
  needs: ['mass', 'staticCase', 'floorStatic', 'wheelStiffness'],
  params: [],
  compute: ({ mass, staticCase, floorStatic, wheelStiffness }, { spec, data }) => ({ spec, data, mass, staticCase, floorStatic, wheelStiffness }),
});

/**
 * The ride model in three parts, each run only where something reads it: the
 * cases over rough ground (the routine factors read these alone), over the
 * stone (the stone's factors), and the drop test. A re-run that reaches only
 * the routine factors (a decisive trial, a sweep point) runs two cases, not five.
 * The ride's input is read only where the ride runs (a model's needs are
 * computed on first read): a statics-only run computes neither it nor the
 * wheel's stiffness, which only the ride reads.
 */
const rideGroup =
  (cases: readonly RideCase[]) =>
  (models: { readonly rideInput: RideInput }, { spec, ride, rideSeries }: ModelInputs) =>
    // The check's result draws each series at PLOT_SAMPLES points: only those samples are taken.
    ride && spec.crew.length > 0 ? someRideCases(models.rideInput, cases, rideSeries === false ? { series: false } : { plotPoints: PLOT_SAMPLES }) : null;

export const rideRoughDef = defineModel({ id: 'rideRough', needs: ['rideInput'], params: RIDE, compute: rideGroup(ROUTINE_CASES) });
export const rideStoneDef = defineModel({ id: 'rideStone', needs: ['rideInput'], params: RIDE, compute: rideGroup(STONE_CASES) });
export const rideDropDef = defineModel({ id: 'rideDrop', needs: ['rideInput'], params: RIDE, compute: rideGroup(['drop']) });

/** Every case of the ride model, in the order of RIDE_CASES. */
export const rideDef = defineModel({
  id: 'ride',
  needs: ['rideRough', 'rideStone', 'rideDrop'],
  params: [],
  compute: ({ rideRough, rideStone, rideDrop }) => {
    if (!rideRough || !rideStone || !rideDrop) return null;
    const all = { ...rideRough, ...rideStone, ...rideDrop };
    return Object.fromEntries(RIDE_CASES.map((c) => [c, all[c]!])) as Record<RideCase, RideResult>;
  },
});

export const floorDampingNeededDef = defineModel({
  id: 'floorDampingNeeded',
  needs: ['rideInput'],
  params: RIDE,
  compute: (models, { spec, ride }) => (ride && spec.crew.length > 0 ? floorDampingNeeded(models.rideInput) : null),
});

/** The routine rough ground's dynamic factors: a variable action in the fundamental combinations. */
export const bumpFactorsDef = defineModel({
  id: 'bumpFactors',
  needs: ['rideRough'],
  params: ['load-cases.routine_factor_bound'],
  compute: ({ rideRough }, { data }) => groundFactors(rideRough, 'rough-ground', param(data, 'load-cases', 'routine_factor_bound')),
});

/** The stone strike's dynamic factors: an accidental action. */
export const stoneFactorsDef = defineModel({
  id: 'stoneFactors',
  needs: ['rideStone'],
  params: ['load-cases.stone_factor_bound'],
  compute: ({ rideStone }, { data }) => groundFactors(rideStone, 'stone', param(data, 'load-cases', 'stone_factor_bound')),
});

/**
 * The four loaded floor states of the check solved together: the net, its
 * frame and the pretension built and solved once, each state started from the
 * one below it, the lightest from the standing floor (floorModels). Each of
 * the four models below picks its own.
 */
export const floorLoadedDef = defineModel({
  id: 'floorLoaded',
  needs: ['bumpFactors', 'stoneFactors', 'floorSetup', 'floorStatic'],
  params: [...FLOOR, ...COMBINATION_PARAMS],
  compute: ({ bumpFactors, stoneFactors, floorSetup, floorStatic }, { spec, data }) => {
    // Nothing reads a loaded state's tangent under the crew (the ride model's spring is the standing floor's): not computed.
    const factors = [bumpFactors.crew, stoneFactors.crew, designFloorFactor(data, null), designFloorFactor(data, bumpFactors.crew)];
    // Every loaded state is heavier than the standing floor of the same net: the lightest starts from it, the rest each
    // from the one below (floorModels), so no state starts from the sags on rigid anchors.
    const [bump, stone, design, designRough] = floorModels(spec, data, factors, { crewTangent: false, start: floorStatic.solution }, floorSetup);
    return { bump, stone, design, designRough };
  },
});

/** The floor over routine rough ground: the crew's weight times its dynamic factor (characteristic). */
export const floorBumpDef = defineModel({
  id: 'floorBump',
  needs: ['floorLoaded'],
  params: [],
  compute: ({ floorLoaded }) => floorLoaded.bump,
});

/** The floor under the stone: an accidental case, every action × 1.0, so also its design state. */
export const floorStoneDef = defineModel({
  id: 'floorStone',
  needs: ['floorLoaded'],
  params: [],
  compute: ({ floorLoaded }) => floorLoaded.stone,
});

/** The floor under the fundamental combination, the crew standing: their weight × γ_Q. */
export const floorDesignDef = defineModel({
  id: 'floorDesign',
  needs: ['floorLoaded'],
  params: [],
  compute: ({ floorLoaded }) => floorLoaded.design,
});

/** The floor under the fundamental combination over rough ground: the crew's weight and its dynamic increment × γ_Q. */
export const floorDesignRoughDef = defineModel({
  id: 'floorDesignRough',
  needs: ['floorLoaded'],
  params: [],
  compute: ({ floorLoaded }) => floorLoaded.designRough,
});

export const memberCasesDef = defineModel({
  id: 'memberCases',
  needs: ['mass', 'loadCases', 'turn', 'bumpFactors', 'stoneFactors'],
  params: ['load-cases.stopping_shock_factor', ...TIMBER, ...BALANCE],
  compute: ({ mass, loadCases, turn, bumpFactors, stoneFactors }, { spec, data }) => memberCases(spec, data, mass, loadCases, turn, wheelInput(bumpFactors), wheelInput(stoneFactors)),
});

/** The wheel's ring frame with the contact at every position, for each member case's ground load: solved once for the joints' and the spokes' checks. */
export const wheelRingScanDef = defineModel({
  id: 'wheelRingScan',
  needs: ['mass', 'memberCases'],
  params: TIMBER_STIFFNESS,
  compute: ({ mass, memberCases }, { spec, data }) => {
    const ws = wheelRingSpec(spec, data, mass.layout);
    return { ws, scans: scanWheelRing(ws, memberCases.map((c) => c.wheel_N)) };
  },
});

export const cuttingDef = defineModel({
  id: 'cutting',
  needs: ['mass'],
  params: CUTTING,
  compute: ({ mass }, { spec, data, lp }) => cuttingResult(spec, data, mass.layout, lp),
});

export const lashingDemandsDef = defineModel({
  id: 'lashingDemands',
  needs: ['mass', 'loadCases', 'turn', 'floorBump', 'bumpFactors', 'stoneFactors'],
  params: ['load-cases.stopping_shock_factor', ...ROLLING_PARAMS, ...COMBINATION_PARAMS],
  compute: ({ mass, loadCases, turn, floorBump, bumpFactors, stoneFactors }, { spec, data }) => lashingDemands({ spec, data, mass, cases: loadCases, turn, floorBump, bump: bumpFactors.crew, stone: stoneFactors.crew }),
});

// The outputs: what the result carries besides the findings.

export const figuresDef = defineModel({
  id: 'figures',
  needs: ['mass', 'loadCases', 'staticCase', 'turn', 'floorStatic', 'floorBump', 'floorStone', 'ride', 'bumpFactors', 'stoneFactors', 'cutting', 'draught'],
  params: [...TIMBER_STIFFNESS, ...COMBINATION_PARAMS, 'ride.inputs.decay_fraction', 'ride.inputs.duration_s'], // the pole's Euler load; the turn's limits in equilibrium; the decay figure's reason
  compute: (m, i) => figures(withInputs(m, i)),
});

export const loadsDef = defineModel({
  id: 'loads',
  needs: ['loadCases', 'turn', 'floorStatic', 'floorBump', 'memberCases', 'lashingDemands'],
  params: [],
  compute: (m, i) => collectLoads(withInputs(m, i)),
});

export const sceneDef = defineModel({
  id: 'scene',
  needs: ['floorStatic', 'mass', 'staticCase', 'turn'],
  params: [],
  compute: (m, i) => buildScene(withInputs(m, i)),
});

export const plotsDef = defineModel({
  id: 'plots',
  needs: ['turn', 'horse'],
  params: BALANCE, // the horse-load plot solves the balance at each crew position; the turn's limits in equilibrium
  compute: (m, i) => reportPlots(withInputs(m, i)),
});

/** The lightest horse's mass: as given, by tape, or the low end of a preset band. */
export const horseDef = defineModel({
  id: 'horse',
  needs: [],
  params: HORSE_PARAMS,
  compute: (_, { spec, data }) => horseMass(spec, data),
});

/** The pull up the design grade and the team's pull (draught.pull, the figures). */
export const draughtDef = defineModel({
  id: 'draught',
  needs: ['mass', 'horse'],
  params: ROLLING_PARAMS,
  compute: ({ mass, horse }, { spec, data }) => draught(spec, data, mass, horse),
});

/** Every model, in no particular order: the graph finds the order from their needs. */
export const MODELS: readonly ModelDef[] = [
  massDef, loadCasesDef, staticCaseDef, turnDef, floorSetupDef, floorStaticDef, wheelStiffnessDef, rideInputDef, rideRoughDef, rideStoneDef, rideDropDef, rideDef, floorDampingNeededDef, bumpFactorsDef, stoneFactorsDef, floorLoadedDef, floorBumpDef, floorStoneDef, floorDesignDef, floorDesignRoughDef, memberCasesDef, wheelRingScanDef, cuttingDef, lashingDemandsDef,
  figuresDef, loadsDef, sceneDef, plotsDef,
  horseDef, draughtDef,
];
