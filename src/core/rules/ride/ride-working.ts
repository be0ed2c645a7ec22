import { param } from '../../data/param.ts';
import type { RulesData } from '../../data/rules-data.ts';
import type { MessageSpec, Report } from '../../pipeline/define-rule.ts';
import { measuredFloorDamping } from '../../ride/ride-build.ts';
import { groundContact, roughGround } from '../../ride/ride-data.ts';
import { wheelBuild } from '../../model/tyre.ts';
import { groundOf, type RideCase, type RideResult } from '../../ride/ride-types.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';

// What the ride rules share: the ride model's working and the sources of its
// data, and the finding for a run in which the ride model was not started.

/** Why a case gave no finite measure: the ride model's own reason, or the floor's (its stiffness unknown). */
export const notRunReason = (r: RideResult): string => r.stopped ?? 'the ride model gave no finite value (see floor.convergence)';

export const NOT_RUN_FIX = 'Fix what stops the model (the reason above; see floor.convergence for the floor), then check again.';

/** The ride model's parameters and method, for a finding's working. */
export function rideWorking(r: RideResult): string[] {
  return [`ride model (design basis, section 8), ${r.title}:`, ...r.working, r.stopped ? `integration: not run: ${r.stopped}` : `integration: ${r.method}, ${r.steps} steps`];
}

/** Ids of the sources of the ride model's parameters this build reads in one case (rules/parameters/ride.yaml). */
export function rideSourceIds(data: RulesData, spec: CheckedSpecification, which: RideCase): string[] {
  const read: [string, string][] = [
    ['ride.wheel-contact', `stiffness_${wheelBuild(spec)}`],
    ['ride.wheel-contact', 'damping_ratio'],
    ['ride.supports', 'yoke_pad_stiffness'],
    ['ride.supports', 'yoke_damping_ratio'],
    ['ride.supports', 'shear_modulus_ratio'],
    ['ride.supports', 'legs_stiffness'],
    // A measured floor's damping comes from the specification, not the data.
    ...(measuredFloorDamping(spec) ? [] : [['ride.supports', 'floor_damping_ratio'] as [string, string]]),
    ['ride.inputs', 'duration_s'],
    ['ride.inputs', 'sample_interval_s'],
  ];
  // The drop test falls on rigid ground.
  const over = groundOf(which);
  const ground = over === null ? null : groundContact(data, spec.operation.ground);
  const ids = read.flatMap(([g, n]) => param(data, g, n).sources);
  if (ground) ids.push(...ground.k.sources, ...ground.zeta.sources);
  // The rough ground's ridge, where the data gives it (the stone is the specification's).
  if (over === 'rough-ground') {
    const rough = roughGround(spec, data);
    ids.push(...rough.height.sources, ...rough.length.sources);
  }
  return [...new Set(ids)];
}

/** The message of a ride rule's finding where the ride model was not run; the rule names what goes unchecked. */
export const notRunMessage = (code: number, what: string): MessageSpec => ({ code, text: `The ride model was not run (a statics-only run), so ${what} is not checked.` });

/** Not run is not a pass: advice that the rule could not look. */
export function rideNotRun(): Report<never, 'notRun'> {
  return {
    subject: 'ride.model',
    label: 'ride model',
    message: 'notRun',
    severity: 'advice',
    fix: 'Run the full check (with the ride model) to have this checked.',
    working: ['the ride model runs only in a full check with a crew aboard; this run did not start it'],
  };
}
