import type { RideResult } from '../../ride/ride-types.ts';

/** The ride model's parameters and method, for a finding's working. */
export function rideWorking(r: RideResult): string[] {
  return [`ride model (mechanics note, section 8), ${r.title}:`, ...r.working, `integration: ${r.method}, ${r.steps} steps`];
}

/** Sources of the ride model's data, for a finding's source line. */
export const rideSources = (r: RideResult) => [...new Set(r.sources)].join('; ');
