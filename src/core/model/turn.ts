import type { RulesData } from '../data/rules-data.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G, UNITS, mm } from '../units/units.ts';
import type { MassModel } from './mass-model.ts';

// Steady turn of a single trailing axle behind the yoke (mechanics note,
// section 4). SI units throughout: m, s, N.

export interface TurnModel {
  /** Yoke path radius, m. */
  yokeRadius: number;
  /** Axle to yoke, horizontal, m. */
  reach: number;
  /** False where the yoke's circle is not wider than the pole reaches: no steady turn. */
  steady: boolean;
  axleRadius: number;
  innerRadius: number;
  outerRadius: number;
  /** Inner over outer wheel path radius (negative: the inner wheel runs backwards); null where there is no steady turn. */
  wheelSpeedRatio: number | null;
  /** Yoke path radius minus axle path radius, m. */
  offTracking: number;
  speed: number;
  yawRate: number;
  lateralAccel: number;
  track: number;
  /** Rolling assembly centre of mass height, crew as placed, m. */
  cgHeight: number;
  ssf: number;
  rolloverAccel: number;
  /** Team speed at which this turn reaches the rollover threshold, m/s; null where there is no steady turn. */
  rolloverSpeed: number | null;
  lateralFriction: number;
  slideAccel: number;
  /** Rolling assembly mass and the weight on the wheels (the axle load), kg and N. */
  mass: number;
  wheelsLoad: number;
  loadTransfer: number;
  outerWheel: number;
  innerWheel: number;
  /** Lateral ground force on each wheel, shared in proportion to its load, N. */
  outerLateral: number;
  innerLateral: number;
}

/** Lateral acceleration at the axle for team speed v on yoke radius Ry: v^2 sqrt(Ry^2 - L^2)/Ry^2. */
export function lateralAccelAt(v: number, yokeRadius: number, reach: number): number {
  if (yokeRadius <= reach) return 0;
  return (v * v * Math.sqrt(yokeRadius * yokeRadius - reach * reach)) / (yokeRadius * yokeRadius);
}

/**
 * The least yoke radius at which the lateral acceleration at speed v stays at
 * or below `allowed`: the larger root of allowed^2 u^2 - v^4 u + v^4 L^2 = 0
 * in u = Ry^2. Where the acceleration never reaches `allowed`, any turn the
 * pole reach permits will do, and the answer is the reach itself.
 */
export function tightestYokeRadius(v: number, allowed: number, reach: number): number {
  const v4 = v ** 4;
  const disc = v4 * v4 - 4 * allowed * allowed * v4 * reach * reach;
  if (disc < 0 || allowed <= 0) return allowed <= 0 ? Infinity : reach;
  return Math.sqrt((v4 + Math.sqrt(disc)) / (2 * allowed * allowed));
}

export function turnModel(spec: CheckedSpecification, data: RulesData, mass: MassModel, wheelsLoad: number): TurnModel {
  const yokeRadius = spec.operation.turn_radius_m;
  const reach = mm(spec.pole.yoke_x_mm - spec.axle.x_mm);
  const track = mm(spec.wheels.track_mm);
  const steady = yokeRadius > reach;
  const axleRadius = steady ? Math.sqrt(yokeRadius ** 2 - reach ** 2) : 0;
  const innerRadius = axleRadius - track / 2;
  const outerRadius = axleRadius + track / 2;
  const speed = spec.operation.speed_kmh * UNITS.kmh.si;
  const lateralAccel = lateralAccelAt(speed, yokeRadius, reach);
  const cgHeight = mm(mass.rolling.z_mm);
  const ssf = track / (2 * cgHeight);
  const rolloverAccel = G * ssf;
  const lateralFriction = data.grounds[spec.operation.ground].lateral_friction.value;
  const m = mass.rolling.mass_kg;
  const loadTransfer = (m * lateralAccel * cgHeight) / track;
  const outerWheel = wheelsLoad / 2 + loadTransfer;
  const innerWheel = wheelsLoad / 2 - loadTransfer;
  const lateral = m * lateralAccel;
  return {
    yokeRadius,
    reach,
    steady,
    axleRadius,
    innerRadius,
    outerRadius,
    wheelSpeedRatio: steady ? innerRadius / outerRadius : null,
    offTracking: yokeRadius - axleRadius,
    speed,
    yawRate: speed / yokeRadius,
    lateralAccel,
    track,
    cgHeight,
    ssf,
    rolloverAccel,
    rolloverSpeed: steady ? yokeRadius * Math.sqrt(rolloverAccel / axleRadius) : null,
    lateralFriction,
    slideAccel: lateralFriction * G,
    mass: m,
    wheelsLoad,
    loadTransfer,
    outerWheel,
    innerWheel,
    outerLateral: wheelsLoad > 0 ? (lateral * Math.max(outerWheel, 0)) / wheelsLoad : 0,
    innerLateral: wheelsLoad > 0 ? (lateral * Math.max(innerWheel, 0)) / wheelsLoad : 0,
  };
}
