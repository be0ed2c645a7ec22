import { formatNumber } from '../format/number-format.ts';

// Properties of solid cross-sections (mechanics note, section 6). Any
// consistent unit; the member rules use mm.

export interface Section {
  /** e.g. "78 × 72 mm rectangle", "30 mm round". */
  label: string;
  area: number;
  /** Second moment of area about the bending axis. */
  I: number;
  /** Elastic section modulus about the bending axis, I / (depth/2). */
  W: number;
  /** Least second moment of area (buckling). */
  Imin: number;
  /** Shear stress factor: peak shear stress = factor · V / area. */
  shearFactor: number;
  /** How W and the area are found, as a finding's working writes them (the formula, and the same with the sizes put in), and the shear factor as written. */
  formulas: { W: [string, string]; area: [string, string]; shearFactor: string };
}

const n = (v: number) => formatNumber(v, '', 4);

/** A rectangle b wide and h deep, bent about the axis parallel to b: W = b h²/6. */
export function rectangle(b: number, h: number): Section {
  return {
    label: `${b} × ${h} mm rectangle`,
    area: b * h,
    I: (b * h ** 3) / 12,
    W: (b * h * h) / 6,
    Imin: (Math.max(b, h) * Math.min(b, h) ** 3) / 12,
    shearFactor: 1.5,
    formulas: { W: ['b·h²/6', `${n(b)} × ${n(h)}²/6`], area: ['b·h', `${n(b)} × ${n(h)}`], shearFactor: '1.5' },
  };
}

/** A solid round of diameter d: W = π d³/32, I = π d⁴/64. */
export function round(d: number): Section {
  const I = (Math.PI * d ** 4) / 64;
  return {
    label: `${d} mm round`,
    area: (Math.PI * d * d) / 4,
    I,
    W: (Math.PI * d ** 3) / 32,
    Imin: I,
    shearFactor: 4 / 3,
    formulas: { W: ['π·d³/32', `π × ${n(d)}³/32`], area: ['π·d²/4', `π × ${n(d)}²/4`], shearFactor: '4/3' },
  };
}
