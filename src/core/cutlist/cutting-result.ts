import type { Size } from './size.ts';
import type { WheelGeometry } from './wheel-geometry.ts';
import type { CuttingPlan } from '../stock/cutting-types.ts';

// What the cut list, leather list, wheel setting-out and stock plan add to a
// check result. Lengths in mm, volumes in m^3, masses in kg.

/** One allowance a rough size or a spare count takes, and what its value rests on. */
export interface CutAllowance {
  /** What it is for: "ends", "bending-form ends", "faces", "green shrinkage, tangential", "spares". */
  what: string;
  /** Where the value is read: a specification path, a rules parameter, or a species' data. */
  from: string;
  value: number;
  unit: string;
  /** Catalogue ids of its sources; empty for a value the specification gives or defaults. */
  sources: string[];
}

export interface CutListItem {
  part: string;
  quantity: number;
  species: string;
  finished: Size;
  /** With machining allowances, green shrinkage, bending-form allowances. */
  rough: Size;
  /** e.g. "straight grain, riven", "straight grain, sawn". */
  grain: string;
  steam_bent: boolean;
  /** Spare blanks ordered at the expected bending failure rate, over and above quantity. */
  spares: number;
  /** Rough volume of one piece. */
  volume_m3: number;
  /** Finished mass of one piece at the stated moisture content. */
  mass_kg: number;
  /** How the rough size was found, with numbers. */
  basis: string;
  /** The allowances the rough size and the spares take, each with its sources. */
  allowances: CutAllowance[];
}

export interface LeatherItem {
  item: string;
  material: string;
  quantity: number;
  width_mm: number;
  thickness_mm: number;
  /** Length of one piece, wrap-rounds and tails included. */
  length_mm: number;
  /** Area of all pieces. */
  area_m2: number;
  basis: string;
}

export interface HideNeed {
  material: string;
  area_m2: number;
  usable_hide_m2: number;
  waste_factor: number;
  hides: number;
  basis: string;
}

export interface WheelSettingOut {
  spokes: number;
  spoke_length_shoulders_mm: number;
  spoke_length_overall_mm: number;
  tenon_nave_mm: number;
  tenon_felloe_mm: number;
  mortise_spacing_deg: number;
  /** Angle of each mortise round the nave from the first, degrees. */
  mortise_positions_deg: number[];
  felloe_pieces: number;
  felloe_arc_mm: number;
  felloe_chord_mm: number;
  /** Angle between a felloe end face and the chord, degrees (the end faces are radial). */
  felloe_end_angle_deg: number;
  /** Dowel positions: angle round the wheel of each felloe joint, degrees. */
  dowel_positions_deg: number[];
  tyre_length_mm: number | null;
  /** What the dimensioned drawing for the apprentice is made from (the render layer draws it). */
  geometry: WheelGeometry;
  basis: string[];
}

export interface StockPlanGroup {
  species: string;
  /** The listed stock section the group is cut from. */
  section: { width_mm: number; thickness_mm: number };
  plan: CuttingPlan;
}

export interface StockPlan {
  groups: StockPlanGroup[];
  pieces: number;
  cost: number | null;
  waste_pct: number;
  /** Parts no listed stock serves, with what to buy instead (also findings). */
  unserved: { part: string; reason: string; buy: string }[];
}

export interface CuttingResult {
  cut_list: CutListItem[];
  leather: { items: LeatherItem[]; hides: HideNeed[] };
  setting_out: WheelSettingOut;
  stock_plan: StockPlan;
}
