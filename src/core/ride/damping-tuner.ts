import { limitLevel } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import { leastOnGrid } from './bisect-least.ts';
import type { RideInput } from './ride-build.ts';
import { rideParam } from './ride-data.ts';
import { rideCaseOf } from './ride-model.ts';
import { ROUTINE_CASES, type RideCase, type RideResult } from './ride-types.ts';
import { crewExcess, crewLeaves, meetsRideRules, type CrewLimits } from './ride-verdict.ts';
import { secantLeast, type SecantLeast, type Trial } from './secant-least.ts';
import { shortDrop } from './short-drop.ts';

// The floor-damping tuner: the least floor damping ratio with which the crew
// stay on the floor over routine rough ground and their motion dies out within
// the decay rule's cycles (design basis, section 8). The decay decides it on
// the demonstration builds. Its search is a secant over short drop runs
// (short-drop.ts) on the decay's shortfall (decay-shortfall.ts), the fraction
// by which the decrement falls short of the one needed: continuous in the
// damping and at most zero exactly where the rule's own measure holds. It
// starts from the single-degree-of-freedom ratio ζ = δ/√(4π² + δ²) of the
// needed decrement δ = ln(1/f)/N (for one mass on a spring δ = 2πζ/√(1 − ζ²),
// Thomson and Dahleh, section 2.6), then steps in proportion (the decrement
// rises nearly in proportion to the damping ratio), then the secant
// (secant-least.ts). The ratio found is confirmed by full runs of the drop and
// the two rough-ground cases under both rules. Where the crew then leave the
// floor, a second secant, on how far they are beyond the crew rule, runs the
// rough-ground cases they leave the floor in, from the decay's ratio up; its
// ratio is confirmed the same way. Where a search does not settle or a
// confirmation fails, full runs walk up the grid and bisect, as the brute
// force does.

export interface DampingNeeded {
  /** The least floor damping ratio that meets both rules; null if none up to the upper bound does. */
  ratio: number | null;
  /** The least and greatest floor damping ratios searched. */
  bounds: readonly [number, number];
  /** Relative tolerance on the ratio. */
  tolerance: number;
  /** True when even the lower bound meets them (any damping does). */
  atLower: boolean;
  /** Simulations in all: short drop runs for the decay and full runs to confirm. */
  simulations: number;
  /** Of them, the short drop runs of the secant search. */
  shortRuns: number;
  working: string;
}

/** The crew rule's hard levels: beyond them the rule fails, so the tuner must keep within them. */
export const crewLimits = (data: RulesData): CrewLimits => ({
  airborne_ms: limitLevel(data, 'ride.crew-airborne', 'airborne_ms', 'hard'),
  rise_mm: limitLevel(data, 'ride.crew-airborne', 'rise_mm', 'hard'),
});

/** Floor damping ratios the full runs walk up where the crew leave the floor at the decay's ratio. */
export const DAMPING_GRID: readonly number[] = [0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.45, 0.7, 1];

/** Short runs at most: the target is three; more only where the secant has not settled by then. */
const MAX_SHORT_RUNS = 8;

/** Trials at most of the crew's secant (each a full run of the rough-ground cases the crew leave the floor in). */
const MAX_CREW_TRIALS = 10;

/** The single-degree-of-freedom damping ratio whose decrement is δ: from δ = 2πζ/√(1 − ζ²). */
export const ratioOfDecrement = (delta: number) => delta / Math.sqrt(4 * Math.PI ** 2 + delta * delta);

export function floorDampingNeeded(i: RideInput, tolerance = 5e-3): DampingNeeded {
  const limits = crewLimits(i.data);
  const maxCycles = limitLevel(i.data, 'ride.decay', 'cycles', 'hard');
  const fraction = rideParam(i.data, 'ride.inputs', 'decay_fraction').value;
  const [lower, upper] = [DAMPING_GRID[0], DAMPING_GRID[DAMPING_GRID.length - 1]];
  const bounds = [lower, upper] as const;
  const needed = Math.log(1 / fraction) / maxCycles;
  const clamp = (z: number) => Math.min(upper, Math.max(lower, z));
  let shortRuns = 0, fullRuns = 0;
  const count = () => `${shortRuns} short drop runs and ${fullRuns} full runs`;
  const result = (ratio: number | null, atLower: boolean, working: string): DampingNeeded =>
    ({ ratio, bounds, tolerance, atLower, simulations: shortRuns + fullRuns, shortRuns, working });

  // Full runs, each made once whichever search asks for it.
  const made = new Map<string, RideResult>();
  const key = (c: RideCase, zeta: number) => `${c} ${zeta}`;
  const full = (zeta: number, c: RideCase) => {
    const k = key(c, zeta);
    if (!made.has(k)) {
      fullRuns++;
      made.set(k, rideCaseOf(i, c, { floorDampingRatio: zeta }));
    }
    return made.get(k)!;
  };
  const rules = (zeta: number) => {
    const rides: Partial<Record<RideCase, RideResult>> = {};
    for (const c of ['drop', ...ROUTINE_CASES] as RideCase[]) {
      rides[c] = full(zeta, c);
      if (!meetsRideRules(rides, limits, maxCycles)) return false;
    }
    return true;
  };
  const walkUp = (from: number, why: string) => {
    const grid = [from, ...DAMPING_GRID.filter((z) => z > from)];
    const value = leastOnGrid(rules, grid, tolerance).value;
    return result(value, false, value === null
      ? `${why}; no floor damping ratio up to ${upper} meets both rules (${count()})`
      : `${why}; walked up ${grid.map((z) => z.toFixed(3)).join(', ')} and bisected to ${tolerance * 100} %: least ζ_floor = ${value.toFixed(4)} (${count()})`);
  };
  /** The least ratio a search gives: half the tolerance above a secant's root, so that it lies on the side where the rule holds; a trial as it is. */
  const least = (s: SecantLeast) => (s.how === 'secant' ? clamp(s.root! * (1 + tolerance / 2)) : s.root!);
  const trials = (s: SecantLeast) => s.tried.map((p) => p.z.toFixed(4)).join(', ');
  const settled = (s: SecantLeast) => (s.how === 'secant' ? `root ${s.root!.toFixed(4)}, raised by half the tolerance to ${least(s).toFixed(4)}` : s.how === 'bracket' ? `bracketed to ${tolerance * 100} %: ${least(s).toFixed(4)}` : `${least(s).toFixed(4)}, the lower bound`);

  // The decay's ratio: the secant on the shortfall, its verdict checked against the rule's own on every run.
  let disagrees = false;
  const z0 = clamp(ratioOfDecrement(needed));
  const decay = secantLeast(
    (z) => {
      shortRuns++;
      const d = shortDrop(i, z, fraction, maxCycles);
      if ((d.shortfall <= 0) !== d.holds) disagrees = true;
      // ln(δ_needed/δ_eff): nearer a straight line in the ratio than the shortfall itself.
      return d.shortfall < 1 ? -Math.log(1 - d.shortfall) : Infinity;
    },
    z0,
    (p: Trial) => p.z * Math.min(Math.exp(p.g), 4),
    { lower, upper, tolerance, maxTrials: MAX_SHORT_RUNS },
  );
  if (decay.how === 'upper') return result(null, false, `even at the upper bound ${upper} the crew's motion after the drop takes more than ${maxCycles} cycles to fall below the fraction (${count()})`);
  if (decay.how === 'unsettled' || disagrees) {
    return walkUp(lower, `the secant on the decay's shortfall over short drop runs at ζ_floor = ${trials(decay)} ${disagrees ? 'disagreed with the rule\'s own measure' : 'did not settle'}`);
  }
  const candidate = least(decay);
  const atLower = decay.how === 'lower';
  const how = atLower
    ? `the decay is met already at a floor damping ratio of ${lower}`
    : `secant on the decay's shortfall (1 − δ_eff/δ_needed, δ_needed = ln(1/${fraction})/${maxCycles} = ${needed.toFixed(4)}) over short drop runs at ζ_floor = ${trials(decay)} (started from the single-degree ratio ${z0.toFixed(4)}): ${settled(decay)}`;
  if (rules(candidate)) return result(candidate, atLower, `${how}; confirmed by full runs of the drop and the rough-ground cases under both rules (${count()})`);
  // The cases run there in which the crew leave the floor (the confirmation stops at the first failing case; the other is confirmed at the end).
  const leave = ROUTINE_CASES.filter((c) => made.get(key(c, candidate))?.crew.some((m) => crewLeaves(m, limits)));
  if (!leave.length) return walkUp(candidate, `${how}; but the full drop run does not confirm it`);

  // The crew leave the floor at the decay's ratio: the secant on how far beyond the crew rule they are, over the rough-ground cases they leave it in.
  const crew = secantLeast(
    (z) => Math.max(...leave.flatMap((c) => full(z, c).crew.map((m) => crewExcess(m, limits)))),
    candidate,
    // A first step of the excess itself, at least the tolerance's width: twice beyond the limits, twice the damping.
    (p: Trial) => p.z * (1 + Math.max(p.g, 2 * tolerance)),
    { lower: candidate, upper, tolerance, maxTrials: MAX_CREW_TRIALS, walk: DAMPING_GRID },
  );
  const why = `${how}; but there the crew leave the floor over ${leave.join(' and ')}`;
  if (crew.how === 'upper') return result(null, false, `${why}, and still at the upper bound ${upper} (${count()})`);
  if (crew.how === 'unsettled') return walkUp(candidate, `${why}, and the secant on their excess over the crew rule at ζ_floor = ${trials(crew)} did not settle`);
  const ratio = least(crew);
  const crewHow = `${why}: secant on their excess over the crew rule (the larger of the time off the floor and the lift over their limits, less one) over full runs of those cases at ζ_floor = ${trials(crew)}: ${settled(crew)}`;
  if (rules(ratio)) return result(ratio, false, `${crewHow}; confirmed by full runs of the drop and the rough-ground cases under both rules (${count()})`);
  return walkUp(ratio, `${crewHow}; but the full runs there do not confirm it`);
}
