import type { CheckedSpecification } from '../../spec/spec.types.ts';

// The nave on its axle arm as a short beam on two bearings (design basis,
// section 6): the bore bears on the arm over a zone at each end of the nave,
// the middle of the bore taken as clear. A side force F at the rim, a wheel
// radius r from the axle, and the wheel load N_w acting an offset e from the
// nave's mid-length, give the moment M = F·r + N_w·e about the nave's middle;
// the two bearing zones, L_b apart centre to centre, take
//   R = N_w/2 ± M/L_b
// and the more loaded zone presses on the arm and in the bore with the mean
// pressure p = R / (d·l_zone) over its projected area. Lengths mm, forces N.

export interface NaveGeometry {
  /** Nave length L. */
  length: number;
  /** Bore diameter d (the arm's diameter in the nave). */
  bore: number;
  /** Length of each bearing zone, l_zone = zone fraction × L. */
  zone: number;
  /** Distance between the zones' centres, L_b = L − l_zone. */
  span: number;
  /** Wheel radius r: the rim's side force acts this far below the axle. */
  wheelRadius: number;
  /** Offset e of the wheel's plane from the nave's mid-length; the specification holds none, so 0. */
  offset: number;
}

export function naveGeometry(spec: CheckedSpecification, zoneFraction: number): NaveGeometry {
  if (!(zoneFraction > 0 && zoneFraction < 1)) throw new Error(`a bearing zone must be a fraction of the nave between 0 and 1, not ${zoneFraction}`);
  const L = spec.wheels.nave.length_mm;
  const zone = zoneFraction * L;
  return { length: L, bore: spec.wheels.nave.bore_mm, zone, span: L - zone, wheelRadius: spec.wheels.diameter_mm / 2, offset: 0 };
}

export interface NaveBearing {
  /** M = F·r + N_w·e, N·mm. */
  moment: number;
  /** The more loaded zone's reaction, N_w/2 + |M|/L_b. */
  more: number;
  /** The other zone's, N_w/2 − |M|/L_b (negative: it bears on the far side of the arm). */
  less: number;
  /** Mean pressure under the more loaded zone, R / (d·l_zone), MPa. */
  pressure: number;
}

/** The bearing reactions and pressure for a wheel load N (down on the ground, up on the arm) and a side force F at the rim. */
export function naveBearing(g: NaveGeometry, N: number, F: number): NaveBearing {
  const moment = Math.abs(F) * g.wheelRadius + N * g.offset;
  const couple = Math.abs(moment) / g.span;
  const more = N / 2 + couple;
  return { moment, more, less: N / 2 - couple, pressure: more / (g.bore * g.zone) };
}
