import type { WorkingStep } from '../findings/finding.ts';
import { num, step } from '../findings/working.ts';
import { G, mm } from '../units/units.ts';
import type { PartMass } from './part-mass.ts';
import type { RollingResistance } from './rolling-resistance.ts';

// Vertical force the pole puts on the yoke, from moments about the wheels'
// ground contact (design basis, section 3). The rolling resistance depends
// on the weight left on the wheels, N = m*g - R; its two parts act with
// their own arms (rolling-resistance.ts), so with c = (h_y - r)*C_s + h_y*C_b
// solving for R directly gives R = (A + c*m*g) / (L + c).

export interface PoleLoadInput {
  /** Rolling assembly parts, crew and loads included (mm, kg); each with its weight factor and its inertia factor (1 unfactored; the inertia factor defaults to the weight factor times accelFactor). */
  parts: readonly (PartMass & { factor?: number; inertiaFactor?: number })[];
  axleX_mm: number;
  yokeX_mm: number;
  yokeZ_mm: number;
  /** Longitudinal acceleration in g; braking negative. */
  accel_g: number;
  /** Factor on the inertia term (1 unfactored). */
  accelFactor?: number;
  resistance: RollingResistance;
}

export interface PoleLoad {
  pole_N: number;
  axle_N: number;
  /** Rolling resistance force at the ground (soil and hub), N: the pull needed at constant speed. */
  resistance_N: number;
  working: WorkingStep[];
}

export function poleLoad(i: PoleLoadInput): PoleLoad {
  const w = (p: (typeof i.parts)[number]) => p.mass_kg * (p.factor ?? 1);
  // The inertia of each mass acts at its own height, with its own factor (in equilibrium terms the motion and the weights are separate actions).
  const wi = (p: (typeof i.parts)[number]) => p.mass_kg * (p.inertiaFactor ?? (p.factor ?? 1) * (i.accelFactor ?? 1));
  const m = i.parts.reduce((s, p) => s + w(p), 0);
  const mi = i.parts.reduce((s, p) => s + wi(p), 0);
  const hg = mi > 0 ? mm(i.parts.reduce((s, p) => s + wi(p) * p.z_mm, 0) / mi) : 0;
  const xa = mm(i.axleX_mm);
  const L = mm(i.yokeX_mm) - xa;
  const hy = mm(i.yokeZ_mm);
  const a = i.accel_g * G;
  const c = i.resistance.couple_m;
  const gravityMoment = i.parts.reduce((s, p) => s + w(p) * G * (mm(p.x_mm) - xa), 0);
  const inertiaMoment = mi * a * (hy - hg);
  const pole = (gravityMoment + inertiaMoment + c * m * G) / (L + c);
  const axle = m * G - pole;
  const working = [
    step('R_pole = [Σ m_i·g·(x_i − x_a) + m_a·a·(h_y − h_a) + c·m·g] / (L + c)', `[${num(gravityMoment)} + ${num(mi)} × ${num(a)} × (${num(hy)} − ${num(hg)}) + ${num(c)} × ${num(m * G)}] / (${num(L)} + ${num(c)})`, pole, 'N'),
    step('axle load = m·g − R_pole', `${num(m * G)} − ${num(pole)}`, axle, 'N'),
  ];
  return { pole_N: pole, axle_N: axle, resistance_N: i.resistance.total * axle, working };
}
