import { G, mm } from '../units/units.ts';
import type { PartMass } from './part-mass.ts';

// Vertical force the pole puts on the yoke, from moments about the wheels'
// ground contact (mechanics note, section 3). The rolling resistance depends
// on the weight left on the wheels, m*g - R; solving for R directly instead of
// iterating gives R = (A + h_y*C_rr*m*g) / (L + h_y*C_rr).

export interface PoleLoadInput {
  /** Rolling assembly parts, crew and loads included (mm, kg). */
  parts: readonly PartMass[];
  axleX_mm: number;
  yokeX_mm: number;
  yokeZ_mm: number;
  /** Longitudinal acceleration in g; braking negative. */
  accel_g: number;
  rollingResistance: number;
}

export interface PoleLoad {
  pole_N: number;
  axle_N: number;
  /** Rolling resistance force at the ground, N. */
  resistance_N: number;
  working: string;
}

const f = (v: number, d = 1) => v.toFixed(d);

export function poleLoad(i: PoleLoadInput): PoleLoad {
  const m = i.parts.reduce((s, p) => s + p.mass_kg, 0);
  const hg = mm(i.parts.reduce((s, p) => s + p.mass_kg * p.z_mm, 0) / m);
  const xa = mm(i.axleX_mm);
  const L = mm(i.yokeX_mm) - xa;
  const hy = mm(i.yokeZ_mm);
  const a = i.accel_g * G;
  const Crr = i.rollingResistance;
  const gravityMoment = i.parts.reduce((s, p) => s + p.mass_kg * G * (mm(p.x_mm) - xa), 0);
  const inertiaMoment = m * a * (hy - hg);
  const resistanceMoment = hy * Crr * m * G;
  const pole = (gravityMoment + inertiaMoment + resistanceMoment) / (L + hy * Crr);
  const axle = m * G - pole;
  const working = [
    'R_pole = [Σ m_i·g·(x_i − x_a) + m·a·(h_y − h_g) + h_y·C_rr·m·g] / (L + h_y·C_rr)',
    `       = [${f(gravityMoment)} N·m + ${f(m)} kg × ${f(a, 3)} m/s² × (${f(hy, 3)} − ${f(hg, 3)}) m + ${f(hy, 3)} m × ${Crr} × ${f(m * G)} N] / (${f(L, 3)} m + ${f(hy, 3)} m × ${Crr})`,
    `       = ${f(pole)} N`,
    `axle load = m·g − R_pole = ${f(m * G)} − ${f(pole)} = ${f(axle)} N`,
  ].join('\n');
  return { pole_N: pole, axle_N: axle, resistance_N: Crr * axle, working };
}
