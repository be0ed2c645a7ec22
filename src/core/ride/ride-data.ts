import type { Limit, RulesData } from '../data/rules-data.ts';

// The ride model's data from rules/limits/ride.yaml, read in one place.

export function rideLimit(data: RulesData, group: string, name: string): Limit {
  const l = data.limits[group]?.[name];
  if (!l) throw new Error(`rules data has no ${group}.${name}; add it to rules/limits/ride.yaml`);
  return l;
}

/** A ground's stiffness and damping under a rim; null where the ground is not listed (taken as rigid). */
export function groundContact(data: RulesData, ground: string): { k: Limit; zeta: Limit } | null {
  const k = data.limits['ride.ground-contact']?.[ground];
  const zeta = data.limits['ride.ground-damping']?.[ground];
  return k && zeta ? { k, zeta } : null;
}

/** Two springs in series with their damping ratios: the stiffness, and each ratio weighted by its spring's share of the strain energy. */
export function inSeries(a: { k: number; zeta: number }, b: { k: number; zeta: number } | null): { k: number; zeta: number } {
  if (b === null) return a;
  const k = (a.k * b.k) / (a.k + b.k);
  return { k, zeta: a.zeta * (k / a.k) + b.zeta * (k / b.k) };
}
