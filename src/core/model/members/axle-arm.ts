import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { round, type Section } from '../sections.ts';
import { axleSection } from '../spec-sections.ts';

// The axle arm outboard of the box (mechanics note, section 6). Each wheel
// bears at its mid-plane, a = (t - s)/2 outboard of the box's bearing; the
// lateral ground force acts a wheel radius below the axle. Two sections: the
// full axle at the bearing, and the round arm inside the nave bore at the
// nave's inner face, half a nave length from the wheel's mid-plane. Lengths
// in mm, moments in N·mm.

export interface AxleArm {
  /** Bearing to wheel mid-plane. */
  a: number;
  /** Nave inner face to wheel mid-plane. */
  naveArm: number;
  wheelRadius: number;
  bearing: Section;
  spindle: Section;
}

export function axleArm(spec: CheckedSpecification): AxleArm {
  return {
    a: (spec.wheels.track_mm - spec.axle.bearing_span_mm) / 2,
    naveArm: spec.wheels.nave.length_mm / 2,
    wheelRadius: spec.wheels.diameter_mm / 2,
    bearing: axleSection(spec),
    spindle: round(spec.wheels.nave.bore_mm),
  };
}

/**
 * M = N_w·arm + F_lat·r. On the outer wheel the lateral moment in fact opposes
 * the vertical one and on the inner wheel adds to it; adding magnitudes with
 * the outer wheel's loads bounds both wheels (the note's safe side).
 */
export function armMoment(wheel_N: number, lateral_N: number, arm: number, wheelRadius: number): number {
  return wheel_N * arm + Math.abs(lateral_N) * wheelRadius;
}
