import type { Param, RulesData } from '../data/rules-data.ts';
import { param, paramOr } from '../data/param.ts';

// The cut list's allowances and factors, from rules/parameters/cutting.yaml
// under "cutlist".

export type CutlistFactor =
  | 'bend_end_allowance_mm'
  | 'bend_good_fraction'
  | 'nave_tenon_fraction'
  | 'felloe_tenon_fraction'
  | 'linchpin_diameter_fraction'
  | 'linchpin_length_factor'
  | 'hide_waste_factor';

export function cutlistFactor(data: RulesData, name: CutlistFactor): Param {
  return param(data, 'cutlist', name);
}

/** Usable area of one hide of a material: its own figure, else the general one. */
export function usableHide(data: RulesData, material: string): Param & { name: string } {
  return paramOr(data, 'cutlist', [`usable_hide_m2.${material}`, 'usable_hide_m2']);
}
