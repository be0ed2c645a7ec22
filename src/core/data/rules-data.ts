// Shapes of the editable data under rules/. The core receives these already
// loaded (the edge reads the files), so it never touches the file system.
// Every number cites its sources by id (rules/sources.yaml).

export type SourceKind = 'standard' | 'handbook' | 'paper' | 'book' | 'method' | 'record' | 'common-practice' | 'from-memory';

/** One entry of the source catalogue. */
export interface SourceEntry {
  citation: string;
  /** The table, section, page or equation within it. */
  where?: string;
  kind: SourceKind;
  note?: string;
  url?: string;
}

/** A number with the ids of the sources it rests on. */
export interface Sourced {
  value: number;
  sources: string[];
  note?: string;
  /** The sources and the note as one line of text (for working and older readers). */
  source: string;
}

/** A model or rule parameter: a number with its unit and sources. */
export interface Param extends Sourced {
  unit: string;
}

/** The name older code gives a parameter. */
export type Limit = Param;

/** One level of a limit: the value and its sources. */
export interface LimitLevel {
  value: number;
  sources: string[];
  note?: string;
  source: string;
}

/** A limit a rule compares against: an advisory level, a hard level, or both. */
export interface LimitData {
  unit: string;
  advisory?: LimitLevel;
  hard?: LimitLevel;
  note?: string;
}

export interface GreenDry {
  green: Sourced;
  dry12: Sourced;
}

export interface Species {
  name: string;
  botanical: string;
  /** green: basic SG (oven-dry mass over green volume); dry12: oven-dry mass over volume at 12 %. */
  specific_gravity: GreenDry;
  mor_kPa: GreenDry;
  moe_MPa: GreenDry;
  compression_parallel_kPa: GreenDry;
  compression_perpendicular_kPa: GreenDry;
  shear_kPa: GreenDry;
  shrinkage_pct: { radial: Sourced; tangential: Sourced };
  /** Least bend radius over thickness for steamed, air-dried stock; null where no data is held. */
  steam_bend_ratio: { supported: Sourced | null; unsupported: Sourced | null };
}

export interface Leather {
  name: string;
  tensile_strength_MPa: Sourced;
  modulus_MPa: Sourced;
  density_kg_per_m3: Sourced;
  friction_on_wood: { static: Sourced; kinetic: Sourced };
  /** Strength when wet as a fraction of dry strength. */
  wet_strength_factor: Sourced;
}

export interface Ground {
  name: string;
  /** The ground's share of the rolling resistance at the reference wheel diameter (rules/parameters/rolling.yaml). */
  soil_resistance: Sourced;
  lateral_friction: Sourced;
  /** The routine rough ground the ride model runs over where the specification gives no operation.rough_ground: a ridge's height and length, mm. */
  rough_ground?: { height_mm: Sourced; length_mm: Sourced };
}

/** The file each table and group of the data was read from, relative to the folder above rules/ (`rules/limits/floor.yaml`). */
export interface RulesDataFiles {
  tables: Record<string, string>;
  limits: Record<string, string>;
  params: Record<string, string>;
}

export interface RulesData {
  sources: Record<string, SourceEntry>;
  /** Where each part was read from; absent in data built in memory (tests). */
  files?: RulesDataFiles;
  species: Record<string, Species>;
  leathers: Record<string, Leather>;
  grounds: Record<string, Ground>;
  /** Each rule's limits and parameters, by rule id, then by name. */
  limits: Record<string, Record<string, Param | LimitData>>;
  /** Model parameters by group, then by name. */
  params: Record<string, Record<string, Param>>;
}

/** True for a limit with levels, false for a parameter. */
export function isLimitData(x: Param | LimitData): x is LimitData {
  return !('value' in x);
}
