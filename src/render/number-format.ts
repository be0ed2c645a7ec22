// Display precision by unit, shared by the workbook (cell formats) and the
// reports (text), so a figure reads the same in both. Cells keep full precision.

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

export function decimalsForUnit(unit: string): number {
  return DECIMALS_BY_UNIT[unit.trim()] ?? DEFAULT_DECIMALS;
}

/** A spreadsheet number format with the unit's decimals. */
export function numFmtForUnit(unit: string): string {
  const d = decimalsForUnit(unit);
  return d === 0 ? '0' : `0.${'0'.repeat(d)}`;
}

/** Between a number and its unit, so the two never part at a line break. */
export const UNIT_SPACE = '\u00A0';

/** Shown where a value does not exist (no limit, no utilisation). */
export const NO_VALUE = '—';

export function formatNumber(value: number | null, unit: string): string {
  if (value === null) return NO_VALUE;
  if (!Number.isFinite(value)) return String(value);
  const text = value.toFixed(decimalsForUnit(unit));
  // toFixed keeps the sign of tiny negatives ("-0.0"), which reads as a real negative.
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

export function formatPercent(ratio: number | null): string {
  if (ratio === null) return NO_VALUE;
  return `${formatNumber(ratio * 100, '%')}${UNIT_SPACE}%`;
}

/** A number a spreadsheet can hold, or text for the values it cannot (NaN, infinities). */
export function cellNumber(value: number | null): number | string | null {
  if (value === null) return null;
  return Number.isFinite(value) ? value : String(value);
}
