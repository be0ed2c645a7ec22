// Shapes of the editable data under rules/. The core receives these already
// loaded (the edge reads the files), so it never touches the file system.

/** A number with the document and table it came from, or "from memory". */
export interface Sourced {
  value: number;
  source: string;
  note?: string;
}

/** A limit a rule compares against; teachers may edit value and source. */
export interface Limit extends Sourced {
  unit: string;
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
  rolling_resistance: Sourced;
  lateral_friction: Sourced;
}

export interface RulesData {
  species: Record<string, Species>;
  leathers: Record<string, Leather>;
  grounds: Record<string, Ground>;
  /** Limits by rule id, then by limit name. */
  limits: Record<string, Record<string, Limit>>;
}
