import type { Limit, RulesData } from '../data/rules-data.ts';

// The cut list's allowances and factors, from rules/limits/stock.yaml under
// "cutlist" (not a rule of its own).

export type CutlistFactor =
  | 'bend_end_allowance_mm'
  | 'bend_good_fraction'
  | 'nave_tenon_fraction'
  | 'felloe_tenon_fraction'
  | 'linchpin_diameter_fraction'
  | 'linchpin_length_factor'
  | 'hide_waste_factor';

export function cutlistFactor(data: RulesData, name: CutlistFactor): Limit {
  const f = data.limits.cutlist?.[name];
  if (!f) throw new Error(`rules data has no cutlist.${name}; add it to rules/limits/stock.yaml`);
  return f;
}

/** Usable area of one hide of a material: its own figure, else the general one. */
export function usableHide(data: RulesData, material: string): Limit & { name: string } {
  const own = `usable_hide_m2.${material}`;
  const f = data.limits.cutlist?.[own];
  if (f) return { ...f, name: own };
  const general = data.limits.cutlist?.usable_hide_m2;
  if (!general) throw new Error('rules data has no cutlist.usable_hide_m2; add it to rules/limits/stock.yaml');
  return { ...general, name: 'usable_hide_m2' };
}
