import type { Param } from '../data/rules-data.ts';
import { casesOver, type RideCase, type RideResult, type RoadGround } from './ride-types.ts';

// The dynamic load factors of one ground from the ride model (design basis,
// section 8): the crew's peak floor force over their weight for the floor and
// lashing rules, the wheels' peak ground force over static for the member
// rules, and the yoke force's rise over standing for the pole. Two grounds:
// the routine rough ground (its factors are a variable action in the
// fundamental combinations) and the stone (an accidental action). The larger
// of the ground's two road cases (both wheels, one wheel) is used, never below
// 1.0 (the standing load); the drop test is a workshop test, not a road.
// Where the ride model did not run (a statics-only run, no crew aboard) or
// gave no finite factor (the floor was not solved), the data's bound for that
// ground stands in, and the factors say they are provisional.

export interface DynamicFactor {
  value: number;
  /** Where it came from, for a finding: e.g. "ride model, rough-ridge case: 1.83 (…)". */
  source: string;
  /** The ride case it came from, or null for the data's bound. */
  from: RideCase | null;
  /** Catalogue ids the value rests on: the ride model's method, or the bound's sources. */
  sources: string[];
}

/** The dynamic factors of one ground: routine rough ground, or the stone. */
export interface GroundFactors {
  /** The crew's peak floor force over their weight: floor and lashing rules. */
  crew: DynamicFactor;
  /** The wheels' peak ground force over static: member rules. */
  wheel: DynamicFactor;
  /** The ride model's largest yoke force above the standing one, N (never below 0); null without a ride. */
  yokeIncrease_N: number | null;
  /** True where the ride model did not give these factors and the data's bound stands in. */
  provisional: boolean;
}

type Rides = Partial<Record<RideCase, RideResult>> | null;

const BOUND_NAME: Record<RoadGround, string> = { 'rough-ground': 'routine_factor_bound', stone: 'stone_factor_bound' };

function rideFactor(rides: Rides, over: RoadGround, pick: (r: RideResult) => number, what: string, bound: Param): DynamicFactor {
  let best: { c: RideCase; v: number } | null = null;
  for (const c of casesOver(over)) {
    const r = rides?.[c];
    if (!r) continue;
    const v = pick(r);
    if (Number.isFinite(v) && (best === null || v > best.v)) best = { c, v };
  }
  if (best === null) {
    const why = rides === null ? 'the ride model was not run (a statics-only run, or no crew aboard)' : 'the ride model gave no finite factor';
    return { value: bound.value, source: `bound ${BOUND_NAME[over]} ${bound.value} (rules/parameters/load-cases.yaml: ${bound.source}); ${why}: provisional`, from: null, sources: bound.sources };
  }
  const floorNote = best.v < 1 ? ', raised to 1.0 (never below the standing load)' : '';
  return { value: Math.max(1, best.v), source: `ride model, ${best.c} case: ${best.v.toFixed(2)} (${what})${floorNote}`, from: best.c, sources: ['design-basis-ride'] };
}

/** The largest yoke force over the ground's road cases above the standing one, N, never below 0. */
export function yokeIncrease(rides: Rides, over: RoadGround): { value: number; from: RideCase } | null {
  let best: { value: number; from: RideCase } | null = null;
  for (const c of casesOver(over)) {
    const r = rides?.[c];
    if (!r) continue;
    const v = Math.max(Math.abs(r.yokeForceMax_N), Math.abs(r.yokeForceMin_N)) - Math.abs(r.yokeForceStatic_N);
    if (Number.isFinite(v) && (best === null || v > best.value)) best = { value: Math.max(0, v), from: c };
  }
  return best;
}

/** The factors of one ground from the ride's cases over it, or the bound where there are none. */
export function groundFactors(rides: Rides, over: RoadGround, bound: Param): GroundFactors {
  const crew = rideFactor(rides, over, (r) => Math.max(...r.crew.map((c) => c.floor_dlf)), "the crew's peak floor force over their weight", bound);
  const wheel = rideFactor(rides, over, (r) => Math.max(...r.wheels.map((w) => w.dlf)), "the wheels' peak ground force over static", bound);
  return { crew, wheel, yokeIncrease_N: yokeIncrease(rides, over)?.value ?? null, provisional: crew.from === null || wheel.from === null };
}
