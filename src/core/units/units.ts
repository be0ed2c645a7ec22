// Units are defined here once. A key's suffix names its unit; `si` is the
// factor to SI, `qty` the name js-quantities knows it by.

export interface UnitDef {
  suffix: string;
  /** Unit as printed. */
  symbol: string;
  /** Unit name for js-quantities, used when converting user strings. */
  qty: string;
  /** Multiply a value in this unit by `si` to get SI. */
  si: number;
  siSymbol: string;
}

export const UNITS = {
  mm: { suffix: '_mm', symbol: 'mm', qty: 'mm', si: 1e-3, siSymbol: 'm' },
  m: { suffix: '_m', symbol: 'm', qty: 'm', si: 1, siSymbol: 'm' },
  // A horse's girth and length are taped in centimetres.
  cm: { suffix: '_cm', symbol: 'cm', qty: 'cm', si: 1e-2, siSymbol: 'm' },
  kg: { suffix: '_kg', symbol: 'kg', qty: 'kg', si: 1, siSymbol: 'kg' },
  deg: { suffix: '_deg', symbol: '°', qty: 'degree', si: Math.PI / 180, siSymbol: 'rad' },
  kmh: { suffix: '_kmh', symbol: 'km/h', qty: 'km/h', si: 1 / 3.6, siSymbol: 'm/s' },
  N: { suffix: '_N', symbol: 'N', qty: 'N', si: 1, siSymbol: 'N' },
  // A stiffness; its key also ends in _mm, so the longest-suffix rule matters.
  N_per_mm: { suffix: '_N_per_mm', symbol: 'N/mm', qty: 'N/mm', si: 1000, siSymbol: 'N/m' },
  pct: { suffix: '_pct', symbol: '%', qty: 'percent', si: 0.01, siSymbol: '1' },
  // Standard gravity; js-quantities calls it "gee" ("g" would be grams).
  g: { suffix: '_g', symbol: 'g', qty: 'gee', si: 9.80665, siSymbol: 'm/s²' },
} as const satisfies Record<string, UnitDef>;

export type UnitName = keyof typeof UNITS;

/** Standard gravity, m/s² (mechanics note, section 0). */
export const G = UNITS.g.si;

/** The unit a key's name carries, or undefined for a key without one. */
export function unitOfKey(key: string): UnitDef | undefined {
  // Longest suffix first, so `_mm` is not read as `_m`.
  return Object.values(UNITS)
    .filter((u) => key.endsWith(u.suffix))
    .sort((a, b) => b.suffix.length - a.suffix.length)[0];
}

export const mm = (v: number): number => v * UNITS.mm.si;
export const toMm = (metres: number): number => metres / UNITS.mm.si;
