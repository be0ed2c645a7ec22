import type { RigidBody } from './body-inertia.ts';
import { G } from '../units/units.ts';
import { contactDamping, contactForce } from './contact-law.ts';

// The ride model's equations (mechanics note, section 8), gravity explicit,
// forces positive up on the car, small angles. State: displacements from the
// position where every spring is at its free length, then their rates:
//   [w, θ, φ, u_1 .. u_n, w', θ', φ', u_1' .. u_n']
// with w the heave of the car body's centre of mass, θ pitch (nose up), φ roll
// (left side up) and u_i each crew member's height. SI units.

/** A one-sided spring and damper: the contact law of contact-law.ts, about a standing compression xs. */
export interface Contact {
  k: number;
  c: number;
  /** Standing compression of the damped spring, m: the damping is c there, and c·x/xs at indentation x. */
  xs: number;
}

export interface CrewMass extends Contact {
  role: string;
  m: number;
  x: number;
  y: number;
}

/**
 * A wheel on the ground: the wheel's own spring and damper (kWheel, c) in
 * series with the ground's (kGround, cGround). Where the ground has a damper
 * the point between the two is a state of its own, its compression x_g with
 * cGround·x_g' = F − kGround·x_g, so the force through the wheel cannot jump
 * when the road's slope does (the rim striking the bump). With no ground
 * damper the two springs are one, k. The wheel's own damper follows the
 * contact law (damping c·e/xs at compression e of the wheel's spring), so
 * the force rises from zero when the rim touches.
 */
export interface WheelSupport extends Contact {
  side: 'left' | 'right';
  y: number;
  kWheel: number;
  kGround: number;
  cGround: number;
}

export interface YokeSupport {
  x: number;
  k: number;
  c: number;
  /** Roll spring and damper (pole torsion with the yoke on two necks), N·m/rad and N·m·s/rad; 0 without the horses. */
  kRoll: number;
  cRoll: number;
  /** True for a prop that can only push (the drop test, by the contact law); false for the yoke held on the necks. */
  oneSided: boolean;
  /** A prop's standing compression, m (the contact law's xs). */
  xs: number;
}

/** Ground height under wheel `wheel` at time t into out[0] (m) and its rate into out[1] (m/s). */
export type RoadInput = (wheel: number, t: number, out: Float64Array) => void;

export interface RideSystem {
  body: RigidBody;
  axleX: number;
  wheels: WheelSupport[];
  yoke: YokeSupport;
  crew: CrewMass[];
  /** Pitch moment per newton of wheel load from the draught at constant speed, h_y·C_rr (m); 0 at rest. */
  draughtArm: number;
  road: RoadInput;
}

/** Forces of one evaluation, for the record, with the indentation of each one-sided contact (its gap is shut while above zero), m. */
export interface Forces {
  wheel: number[];
  crew: number[];
  yoke: number;
  wheelIndent: number[];
  crewIndent: number[];
  yokeIndent: number;
}

/** Wheels whose ground point is a state (a ground with a damper). */
export const groundNodes = (s: RideSystem) => s.wheels.filter((w) => w.cGround > 0).length;
export const stateSize = (s: RideSystem) => 2 * (3 + s.crew.length) + groundNodes(s);

const ROAD = new Float64Array(2);

/**
 * Accelerations of the state into dy (length stateSize), forces into out when given.
 * With linear = true every contact acts both ways (for the static solution).
 * Written without closures: it is the inner loop of every run.
 */
export function derivative(s: RideSystem, t: number, y: ArrayLike<number>, dy: Float64Array | number[], out?: Forces, linear = false): void {
  const n = s.crew.length;
  const N = 3 + n;
  const b = s.body;
  const w = y[0], th = y[1], ph = y[2], vw = y[N], vth = y[N + 1], vph = y[N + 2];
  let Fz = -b.mass_kg * G, Mth = 0, Mph = 0, wheelSum = 0;
  const ax = s.axleX - b.x;
  let node = 2 * N;
  for (let i = 0; i < s.wheels.length; i++) {
    const wh = s.wheels[i];
    s.road(i, t, ROAD);
    const ay = wh.y - b.y;
    const d = ROAD[0] - (w + ax * th + ay * ph), dd = ROAD[1] - (vw + ax * vth + ay * vph);
    let F: number, indent: number;
    if (linear) {
      F = wh.k * d + wh.c * dd;
      indent = d;
    } else if (wh.cGround > 0) {
      // wheel spring compression e = d − x_g; with e' = d' − x_g' and x_g' = (F − k_g x_g)/c_g solved for F.
      const xg = y[node];
      const e = d - xg;
      const r = contactDamping(wh.c, wh.xs, e) / wh.cGround;
      F = e > 0 ? (wh.kWheel * e + r * wh.cGround * dd + r * wh.kGround * xg) / (1 + r) : 0;
      if (F < 0) F = 0;
      indent = e;
      dy[node] = (F - wh.kGround * xg) / wh.cGround;
      node++;
    } else {
      F = contactForce(wh.k, wh.c, wh.xs, d, dd);
      indent = d;
    }
    if (out) {
      out.wheel[i] = F;
      out.wheelIndent[i] = indent;
    }
    wheelSum += F;
    Fz += F;
    Mth += F * ax;
    Mph += F * ay;
  }
  Mth -= s.draughtArm * wheelSum;
  const yk = s.yoke;
  const yx = yk.x - b.x;
  const dy0 = -(w + yx * th - b.y * ph), ddy0 = -(vw + yx * vth - b.y * vph);
  const Fy = yk.oneSided && !linear ? contactForce(yk.k, yk.c, yk.xs, dy0, ddy0) : yk.k * dy0 + yk.c * ddy0;
  if (out) {
    out.yoke = Fy;
    out.yokeIndent = dy0;
  }
  Fz += Fy;
  Mth += Fy * yx;
  Mph += -Fy * b.y - yk.kRoll * ph - yk.cRoll * vph;
  for (let i = 0; i < n; i++) {
    const c = s.crew[i];
    const cx = c.x - b.x, cy = c.y - b.y;
    const d = w + cx * th + cy * ph - y[3 + i], dd = vw + cx * vth + cy * vph - y[N + 3 + i];
    const F = linear ? c.k * d + c.c * dd : contactForce(c.k, c.c, c.xs, d, dd);
    if (out) {
      out.crew[i] = F;
      out.crewIndent[i] = d;
    }
    Fz -= F;
    Mth -= F * cx;
    Mph -= F * cy;
    dy[N + 3 + i] = F / c.m - G;
    dy[3 + i] = y[N + 3 + i];
  }
  dy[0] = vw;
  dy[1] = vth;
  dy[2] = vph;
  dy[N] = Fz / b.mass_kg;
  dy[N + 1] = Mth / b.Ipitch;
  dy[N + 2] = Mph / b.Iroll;
}

/**
 * Which one-sided contacts have their gap shut (indentation above zero), then
 * which push (force above zero), one bit each: wheels, then crew, then the
 * prop (drop test). A change marks a contact event for the integrator: both
 * the touch and the cut of the contact law are kinks in the forces.
 */
export function contactMode(s: RideSystem, t: number, y: ArrayLike<number>, scratch: Forces): number {
  derivative(s, t, y, MODE_SINK, scratch);
  return modeOf(s, scratch);
}

/** The contact mode of forces already evaluated (see contactMode). Written without closures: it runs at every step. */
export function modeOf(s: RideSystem, f: Forces): number {
  const n = contactCount(s);
  let bits = 0, b = 1;
  for (let i = 0; i < f.wheel.length; i++, b <<= 1) {
    if (f.wheelIndent[i] > 0) bits |= b;
    if (f.wheel[i] > 0) bits |= b << n;
  }
  for (let i = 0; i < f.crew.length; i++, b <<= 1) {
    if (f.crewIndent[i] > 0) bits |= b;
    if (f.crew[i] > 0) bits |= b << n;
  }
  if (s.yoke.oneSided) {
    if (f.yokeIndent > 0) bits |= b;
    if (f.yoke > 0) bits |= b << n;
  }
  return bits;
}
const MODE_SINK = new Float64Array(64);

/** One-sided contacts: the wheels, the crew and, in the drop test, the prop. */
export const contactCount = (s: RideSystem) => s.wheels.length + s.crew.length + (s.yoke.oneSided ? 1 : 0);

/** True when wheel i's gap is shut in a mode from contactMode. */
export const wheelShut = (mode: number, i: number) => (mode & (1 << i)) !== 0;

/** True when crew member i's gap is shut (they stand on the floor) in a mode from contactMode. */
export const crewShut = (s: RideSystem, mode: number, i: number) => (mode & (1 << (s.wheels.length + i))) !== 0;

/** True when any wheel pushes on the ground in a mode from contactMode. */
export const anyWheelPushes = (s: RideSystem, mode: number) => ((mode >> contactCount(s)) & ((1 << s.wheels.length) - 1)) !== 0;

export const newForces = (s: RideSystem): Forces => ({ wheel: s.wheels.map(() => 0), crew: s.crew.map(() => 0), yoke: 0, wheelIndent: s.wheels.map(() => 0), crewIndent: s.crew.map(() => 0), yokeIndent: 0 });

/** Kinetic plus gravity plus spring energy, J (a one-sided spring stores energy only while it pushes): conserved with damping off. */
export function energy(s: RideSystem, t: number, y: ArrayLike<number>): number {
  const n = s.crew.length, N = 3 + n, { body } = s;
  const at = (x: number, yy: number) => y[0] + (x - body.x) * y[1] + (yy - body.y) * y[2];
  let E = 0.5 * body.mass_kg * y[N] ** 2 + 0.5 * body.Ipitch * y[N + 1] ** 2 + 0.5 * body.Iroll * y[N + 2] ** 2 + body.mass_kg * G * y[0];
  for (let i = 0; i < s.wheels.length; i++) {
    s.road(i, t, ROAD);
    const d = ROAD[0] - at(s.axleX, s.wheels[i].y);
    if (d > 0) E += 0.5 * s.wheels[i].k * d * d;
  }
  const dy0 = -at(s.yoke.x, 0);
  if (!s.yoke.oneSided || dy0 > 0) E += 0.5 * s.yoke.k * dy0 * dy0;
  E += 0.5 * s.yoke.kRoll * y[2] ** 2;
  for (let i = 0; i < n; i++) {
    const c = s.crew[i];
    const d = at(c.x, c.y) - y[3 + i];
    E += 0.5 * c.m * y[N + 3 + i] ** 2 + c.m * G * y[3 + i] + (d > 0 ? 0.5 * c.k * d * d : 0);
  }
  return E;
}
