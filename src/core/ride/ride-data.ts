import type { Param, RulesData } from '../data/rules-data.ts';
import { param } from '../data/param.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { mm } from '../units/units.ts';

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

/** A road profile's height or length, m, with where it came from (for the working) and its catalogue ids. */
export interface ProfileValue {
  value: number;
  from: string;
  sources: string[];
}

/**
 * The routine rough ground: the specification's operation.rough_ground, else
 * the ground's own rough_ground in rules/grounds.yaml, else (a ground listed
 * without one) ride.inputs.rough_ground_height_mm and _length_mm.
 */
export function roughGround(spec: CheckedSpecification, data: RulesData): { height: ProfileValue; length: ProfileValue } {
  const given = spec.operation.rough_ground;
  const ground = Object.hasOwn(data.grounds, spec.operation.ground) ? data.grounds[spec.operation.ground].rough_ground : undefined;
  const pick = (key: 'height_mm' | 'length_mm'): ProfileValue => {
    if (given) return { value: mm(given[key]), from: `operation.rough_ground.${key}`, sources: [] };
    if (ground) return { value: mm(ground[key].value), from: `rules/grounds.yaml, ${spec.operation.ground}.rough_ground.${key}: ${ground[key].source}`, sources: ground[key].sources };
    const p = param(data, 'ride.inputs', `rough_ground_${key}`);
    return { value: mm(p.value), from: `ride.inputs.rough_ground_${key} (${spec.operation.ground} gives no rough_ground): ${p.source}`, sources: p.sources };
  };
  return { height: pick('height_mm'), length: pick('length_mm') };
}

/** The stone: operation.bump_height_mm and bump_length_mm (the schema's defaults where the specification gives none). */
export function stone(spec: CheckedSpecification): { height: ProfileValue; length: ProfileValue } {
  const op = spec.operation;
  return {
    height: { value: mm(op.bump_height_mm), from: 'operation.bump_height_mm', sources: [] },
    length: { value: mm(op.bump_length_mm), from: 'operation.bump_length_mm', sources: [] },
  };
}
