// Workbook cells keep full precision; a number format per unit says how many
// decimals a spreadsheet shows. The text outputs use the one formatter instead
// (src/core/format/number-format.ts).

const DECIMALS_BY_UNIT: Record<string, number> = {
  N: 1,
  kN: 2,
  kg: 3,
  mm: 1,
  m: 2,
  g: 2,
  deg: 1,
  '°': 1,
  '%': 1,
  pct: 1,
  'km/h': 1,
  'm/s': 2,
  'm/s^2': 2,
  'm/s²': 2,
  'N/mm': 1,
  MPa: 2,
  kPa: 0,
  Pa: 0,
  'N m': 1,
  'N·m': 1,
  'kg/m^3': 1,
  // A spoke blank is under a thousandth of a cubic metre.
  'm³': 5,
  'm²': 3,
  count: 0,
  ms: 1,
  /** Oscillation cycles, as the ride model counts them (may be fractional). */
  cycles: 1,
  /** Prices are in whatever currency the specification's stock prices are in. */
  currency: 2,
};

/** Decimals for units not listed: enough for ratios and factors. */
const DEFAULT_DECIMALS = 3;

/** A spreadsheet number format with the unit's decimals. */
export function numFmtForUnit(unit: string): string {
  const d = DECIMALS_BY_UNIT[unit.trim()] ?? DEFAULT_DECIMALS;
  return d === 0 ? '0' : `0.${'0'.repeat(d)}`;
}

/** A fraction shown as a percentage. */
export const PERCENT_FORMAT = '0.0%';

/** A number a spreadsheet can hold, or text for the values it cannot (NaN, infinities). */
export function cellNumber(value: number | null): number | string | null {
  if (value === null) return null;
  return Number.isFinite(value) ? value : String(value);
}
