// What the ride model returns for one road case (mechanics note, section 8).

// Two grounds, each under both wheels (a ridge across the track) and under
// one wheel: the routine rough ground (operation.rough_ground, a long, low
// ridge) and the stone (operation.bump_height_mm and bump_length_mm, short
// enough to be struck); then the drop test.
export type RideCase = 'rough-ridge' | 'rough-one-wheel' | 'stone-ridge' | 'stone-one-wheel' | 'drop';

export const RIDE_CASES: readonly RideCase[] = ['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel', 'drop'];

/** The ground a road case runs over: the load case its findings name. */
export type RoadGround = 'rough-ground' | 'stone';

/** Where the ground lies: across both tracks (a ridge), or under the left wheel alone. */
export type RoadShape = 'ridge' | 'one-wheel';
export const ROAD_SHAPES: readonly RoadShape[] = ['ridge', 'one-wheel'];

/** The road case over a ground in a shape. */
export const roadCase = (g: RoadGround, shape: RoadShape): RideCase => (g === 'rough-ground' ? (shape === 'ridge' ? 'rough-ridge' : 'rough-one-wheel') : shape === 'ridge' ? 'stone-ridge' : 'stone-one-wheel');

export const ROUTINE_CASES: readonly RideCase[] = ROAD_SHAPES.map((s) => roadCase('rough-ground', s));
export const STONE_CASES: readonly RideCase[] = ROAD_SHAPES.map((s) => roadCase('stone', s));

/** The road cases over one ground. */
export const casesOver = (g: RoadGround): readonly RideCase[] => (g === 'rough-ground' ? ROUTINE_CASES : STONE_CASES);

/** The ground of a road case; null for the drop test. */
export const groundOf = (c: RideCase): RoadGround | null => (ROUTINE_CASES.includes(c) ? 'rough-ground' : STONE_CASES.includes(c) ? 'stone' : null);

/** True where the road case strikes both wheels at once; false for one wheel. */
export const underBothWheels = (c: RideCase): boolean => c.endsWith('-ridge');

export interface RideChannel {
  name: string;
  unit: string;
  values: number[];
}

/** Time series sampled at a fixed interval for the CSV and the plots. */
export interface RideSeries {
  t_s: number[];
  channels: RideChannel[];
  /** Where only every stride-th sample of the run was kept (and the last), for a plot: the stride; absent where every one was. */
  stride?: number;
}

export interface CrewRide {
  role: string;
  /** Largest rise above the static position, mm. */
  rise_mm: number;
  /** Total time with no contact force from the floor, ms. */
  airborne_ms: number;
  /** Peak floor force over the static force. */
  floor_dlf: number;
  /** Largest height of the person above the floor beneath them while off it, mm (0 if never off). */
  lift_mm: number;
  /** Cycles until this person's motion falls below 10 % of its first amplitude; null if it never does in the run. */
  decay_cycles: number | null;
}

export interface WheelRide {
  wheel: 'left' | 'right';
  airborne_ms: number;
  /** Peak ground force over the static force. */
  dlf: number;
}

export interface RideResult {
  case: RideCase;
  title: string;
  crew: CrewRide[];
  wheels: WheelRide[];
  yokeForceMin_N: number;
  yokeForceMax_N: number;
  /** The yoke force standing (the balance model's pole load), N. */
  yokeForceStatic_N: number;
  /** Cycles until the crew's motion falls below 10 % of its first amplitude; null if it never does in the run. */
  decayCycles: number | null;
  /** Integration method and step, for the working. */
  method: string;
  /** Why the case could not be run (its measures are then NaN and its series empty); absent where it ran. */
  stopped?: string;
  steps: number;
  series: RideSeries;
  /** The crew-on-floor damping ratio used and where it came from. */
  floorDamping: { value: number; source: string };
  /** The model's parameters with their working, and the sources of its data. */
  working: string[];
  sources: string[];
}
