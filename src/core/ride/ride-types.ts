// What the ride model returns for one road case (mechanics note, section 8).

export type RideCase = 'ridge' | 'one-wheel' | 'drop';

export const RIDE_CASES: readonly RideCase[] = ['ridge', 'one-wheel', 'drop'];

export interface RideChannel {
  name: string;
  unit: string;
  values: number[];
}

/** Time series sampled at a fixed interval for the CSV and the plots. */
export interface RideSeries {
  t_s: number[];
  channels: RideChannel[];
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
  steps: number;
  series: RideSeries;
  /** The crew-on-floor damping ratio used and where it came from. */
  floorDamping: { value: number; source: string };
  /** The model's parameters with their working, and the sources of its data. */
  working: string[];
  sources: string[];
}
