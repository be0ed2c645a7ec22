import type { Param, RulesData } from '../data/rules-data.ts';
import { param } from '../data/param.ts';

// The ride model's data from rules/parameters/ride.yaml, read in one place.

export function rideParam(data: RulesData, group: string, name: string): Param {
  return param(data, group, name);
}

/** A ground's stiffness and damping under a rim; null where the ground is not listed (taken as rigid). */
export function groundContact(data: RulesData, ground: string): { k: Param; zeta: Param } | null {
  const has = (g: string) => Object.hasOwn(data.params, g) && Object.hasOwn(data.params[g], ground);
  return has('ride.ground-contact') && has('ride.ground-damping') ? { k: param(data, 'ride.ground-contact', ground), zeta: param(data, 'ride.ground-damping', ground) } : null;
}

/** Two springs in series with their damping ratios: the stiffness, and each ratio weighted by its spring's share of the strain energy. */
export function inSeries(a: { k: number; zeta: number }, b: { k: number; zeta: number } | null): { k: number; zeta: number } {
  if (b === null) return a;
  const k = (a.k * b.k) / (a.k + b.k);
  return { k, zeta: a.zeta * (k / a.k) + b.zeta * (k / b.k) };
}
