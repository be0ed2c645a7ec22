import { limitLevel } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import { leastOnGrid } from './bisect-least.ts';
import type { RideInput } from './ride-build.ts';
import { rideParam } from './ride-data.ts';
import { rideCaseOf } from './ride-model.ts';
import { ROUTINE_CASES, type RideCase, type RideResult } from './ride-types.ts';
import { meetsRideRules, type CrewLimits } from './ride-verdict.ts';
import { shortDropDecrement } from './short-drop.ts';

// The floor-damping tuner: the least floor damping ratio with which the crew
// stay on the floor over routine rough ground and their motion dies out within
// the decay rule's cycles (design basis, section 8). The decay decides it on
// the demonstration builds, and it follows from the logarithmic decrement: the
// cycles N to fall to a fraction f give an effective decrement δ = ln(1/f)/N,
// which rises nearly in proportion to the damping ratio (for one mass on a
// spring δ = 2πζ/√(1 − ζ²), Thomson and Dahleh, section 2.6). So the search
// is a secant on δ(ζ) − δ_needed over short drop runs (ended once the decay is
// decided: short-drop.ts), started from the single-degree-of-freedom ratio
// ζ = δ/√(4π² + δ²), then one proportional step, then the secant, kept in
// the bracket and bisecting it where it does not halve (the decay measure
// jumps where a turning point drops below the fraction). The ratio
// found is confirmed by one full run of the drop and the two rough-ground
// cases under both rules; where the crew then leave the floor, the full runs
// walk on up the grid and bisect as before.

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
  const tried: { z: number; g: number }[] = [];
  const gap = (z: number) => {
    shortRuns++;
    const g = shortDropDecrement(i, z, fraction, maxCycles) - needed;
    tried.push({ z, g });
    return g;
  };

  // The decay's ratio: the secant on the decrement, bracketed once a sign change is seen.
  const z0 = clamp(ratioOfDecrement(needed));
  const g0 = gap(z0);
  let next = clamp(z0 * (needed / Math.max(g0 + needed, needed / 4)));
  let root = next;
  let width = Infinity;
  while (shortRuns < MAX_SHORT_RUNS) {
    gap(next);
    const br = bracket(tried);
    root = secantRoot(tried, br);
    if (br && br.hi.z - br.lo.z <= tolerance * br.hi.z) {
      root = br.hi.z; // narrow enough: the side where the decay holds, as the bisection gives
      break;
    }
    if (Math.abs(root - next) <= 0.25 * tolerance * next && shortRuns >= 2) break;
    if (root <= lower && tried.some((p) => p.z === lower && p.g >= 0)) break;
    if (root >= upper && tried.some((p) => p.z === upper && p.g < 0)) break;
    // Brent's safeguard: where the bracket has not halved, bisect it (the decay measure jumps where a turning point drops below the fraction).
    const w = br ? br.hi.z - br.lo.z : Infinity;
    next = br && w > width / 2 ? 0.5 * (br.lo.z + br.hi.z) : clamp(root);
    width = w;
    if (tried.some((p) => p.z === next)) break;
  }
  const decayFailsAtUpper = tried.some((p) => p.z === upper && p.g < 0);
  const rules = (zeta: number) => {
    const rides: Partial<Record<RideCase, RideResult>> = {};
    for (const c of ['drop', ...ROUTINE_CASES] as RideCase[]) {
      rides[c] = rideCaseOf(i, c, { floorDampingRatio: zeta });
      fullRuns++;
      if (!meetsRideRules(rides, limits, maxCycles)) return false;
    }
    return true;
  };
  const count = () => `${shortRuns} short drop runs and ${fullRuns} full runs`;
  const result = (ratio: number | null, atLower: boolean, working: string): DampingNeeded =>
    ({ ratio, bounds, tolerance, atLower, simulations: shortRuns + fullRuns, shortRuns, working });
  if (decayFailsAtUpper) return result(null, false, `even at the upper bound ${upper} the crew's motion after the drop takes more than ${maxCycles} cycles to fall below the fraction (${count()})`);

  // Half the tolerance above a secant's root, so that the ratio lies on the side where the decay holds; a bracket's upper end as it is.
  const closed = bracket(tried);
  const candidate = clamp(closed && root === closed.hi.z ? root : root * (1 + tolerance / 2));
  const atLower = candidate === lower;
  if (rules(candidate)) {
    const how = atLower
      ? `the rules are met already at a floor damping ratio of ${lower}`
      : `secant on the effective decrement ln(1/${fraction})/N − ${needed.toFixed(4)} over short drop runs at ζ_floor = ${tried.map((p) => p.z.toFixed(4)).join(', ')} (started from the single-degree ratio ${z0.toFixed(4)}): ${candidate === root ? `bracketed to ${tolerance * 100} %: ${root.toFixed(4)}` : `root ${root.toFixed(4)}, raised by half the tolerance to ${candidate.toFixed(4)}`}`;
    return result(candidate, atLower, `${how}; confirmed by full runs of the drop and the rough-ground cases under both rules (${count()})`);
  }
  // The full runs fail at the decay's ratio: the crew leave the floor (or the confirmation disagrees); walk on up.
  const grid = [candidate, ...DAMPING_GRID.filter((z) => z > candidate)];
  const value = leastOnGrid(rules, grid, tolerance).value;
  return result(
    value,
    false,
    value === null
      ? `the decay holds from ζ_floor = ${candidate.toFixed(4)}, but no floor damping ratio up to ${upper} also keeps the crew on the floor over rough ground (${count()})`
      : `the decay holds from ζ_floor = ${candidate.toFixed(4)} (secant over short drop runs), but the full runs fail there; walked up ${grid.map((z) => z.toFixed(3)).join(', ')} and bisected to ${tolerance * 100} %: least ζ_floor = ${value.toFixed(4)} (${count()})`,
  );
}

interface Trial {
  z: number;
  g: number;
}

/** The tightest bracket seen: the greatest ratio where the decay fails below the least where it holds, or null. */
function bracket(tried: readonly Trial[]): { lo: Trial; hi: Trial } | null {
  const fails = tried.filter((p) => p.g < 0), holds = tried.filter((p) => p.g >= 0);
  if (!fails.length || !holds.length) return null;
  const lo = fails.reduce((m, p) => (p.z > m.z ? p : m)), hi = holds.reduce((m, p) => (p.z < m.z ? p : m));
  return lo.z < hi.z ? { lo, hi } : null;
}

/** The secant's next root through the two most recent trials; regula falsi on the bracket where the secant leaves it. */
function secantRoot(tried: readonly Trial[], br: { lo: Trial; hi: Trial } | null): number {
  const through = (a: Trial, b: Trial) => (b.g === a.g ? b.z : b.z - (b.g * (b.z - a.z)) / (b.g - a.g));
  const [a, b] = tried.slice(-2);
  const root = through(a, b);
  return br && !(root > br.lo.z && root < br.hi.z) ? through(br.lo, br.hi) : root;
}
