import type { Limit } from '../data/rules-data.ts';
import type { RideCase, RideResult } from './ride-types.ts';

// The bump case's dynamic load factors from the ride model, in place of the
// placeholder bump_dynamic_factor (rules/limits/load-cases.yaml): the crew's
// peak floor force over static for the floor and lashing rules, the wheels'
// peak ground force over static for the member rules. The larger of the two
// road cases (ridge, one wheel) is used; the drop test is a workshop test,
// not the design bump. Decision: the ride factor is used as it is, but never
// below 1.0 (the standing load); the placeholder is not kept as a floor,
// because it was a guess made until this model existed. Where the ride model
// gives no finite factor (the floor was not solved), the placeholder is used
// and the source says so.

export interface DynamicFactor {
  value: number;
  /** Where it came from, for a finding: e.g. "ride model, ridge case: 1.83 (…)". */
  source: string;
  /** The ride case it came from, or null for the placeholder. */
  from: RideCase | null;
}

type Pick = (r: RideResult) => number;

function rideFactor(rides: Partial<Record<RideCase, RideResult>> | null, pick: Pick, what: string, placeholder: Limit): DynamicFactor {
  let best: { c: RideCase; v: number } | null = null;
  for (const c of ['ridge', 'one-wheel'] as const) {
    const r = rides?.[c];
    if (!r) continue;
    const v = pick(r);
    if (Number.isFinite(v) && (best === null || v > best.v)) best = { c, v };
  }
  if (best === null) return { value: placeholder.value, source: `placeholder bump_dynamic_factor ${placeholder.value} (rules/limits/load-cases.yaml: ${placeholder.source}); the ride model gave no factor`, from: null };
  const value = Math.max(1, best.v);
  const floorNote = best.v < 1 ? `, raised to 1.0 (never below the standing load)` : '';
  return { value, source: `ride model, ${best.c} case: ${best.v.toFixed(2)} (${what})${floorNote}; used in place of the placeholder bump_dynamic_factor ${placeholder.value}`, from: best.c };
}

/** The crew's peak floor force over static: floor and lashing rules. */
export function crewFloorFactor(rides: Partial<Record<RideCase, RideResult>> | null, placeholder: Limit): DynamicFactor {
  return rideFactor(rides, (r) => Math.max(...r.crew.map((c) => c.floor_dlf)), "the crew's peak floor force over their weight", placeholder);
}

/** The wheels' peak ground force over static: member rules. */
export function wheelFactor(rides: Partial<Record<RideCase, RideResult>> | null, placeholder: Limit): DynamicFactor {
  return rideFactor(rides, (r) => Math.max(...r.wheels.map((w) => w.dlf)), "the wheels' peak ground force over static", placeholder);
}

/** The largest yoke force over the road cases above the standing one, N (for the pole's bump case). */
export function yokeIncrease(rides: Partial<Record<RideCase, RideResult>> | null): { value: number; from: RideCase } | null {
  let best: { value: number; from: RideCase } | null = null;
  for (const c of ['ridge', 'one-wheel'] as const) {
    const r = rides?.[c];
    if (!r) continue;
    const v = Math.max(Math.abs(r.yokeForceMax_N), Math.abs(r.yokeForceMin_N)) - Math.abs(r.yokeForceStatic_N);
    if (Number.isFinite(v) && (best === null || v > best.value)) best = { value: v, from: c };
  }
  return best;
}
