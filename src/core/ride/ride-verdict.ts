import { ROUTINE_CASES, type CrewRide, type RideCase, type RideResult } from './ride-types.ts';

// What the ride rules judge, written once so the rules and the damping tuner
// agree: the crew stay on the floor over routine rough ground (its two road
// cases), and their motion after the drop test dies out within the allowed
// cycles. The decay is judged on the drop test: a clean free vibration, the
// same test a builder makes on a floor sample; on the road the crew's motion
// also carries the chariot's pitching on the yoke, which the floor does not
// govern. The stone is an accidental case: the rules report it, but no floor
// damping is tuned to it (a driver slows for a stone; the floor cannot keep a
// crew down on a hard strike).

/** The most time off the floor and the highest rise above it the crew rule allows. */
export interface CrewLimits {
  airborne_ms: number;
  rise_mm: number;
}

/** The crew member is off the floor too long or too high. */
export const crewLeaves = (c: CrewRide, l: CrewLimits) => c.airborne_ms > l.airborne_ms || c.lift_mm > l.rise_mm;

/** How far the crew member is beyond the crew rule: the larger of the time off the floor and the lift over their limits, less one; above zero exactly where crewLeaves (continuous in the floor damping, for the tuner's search). */
export const crewExcess = (c: CrewRide, l: CrewLimits) => Math.max(c.airborne_ms / l.airborne_ms, c.lift_mm / l.rise_mm) - 1;

/** The motion takes more than the allowed cycles to fall below the fraction (or never does in the run). */
export const decaysSlowly = (r: RideResult, maxCycles: number) => r.decayCycles === null || !(r.decayCycles <= maxCycles);

export function meetsRideRules(rides: Partial<Record<RideCase, RideResult>>, crew: CrewLimits, maxCycles: number): boolean {
  // A case that could not run shows nothing safe.
  if (Object.values(rides).some((r) => r?.stopped)) return false;
  for (const c of ROUTINE_CASES) if (rides[c]?.crew.some((m) => crewLeaves(m, crew))) return false;
  return !rides.drop || !decaysSlowly(rides.drop, maxCycles);
}
