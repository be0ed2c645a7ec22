// One number formatter for every message and report: three significant
// figures by default, lengths in whole millimetres from 10 mm up (one
// decimal below), never more than four significant figures. Values keep full precision in the
// JSON and the workbook cells; this is only how they are written in text.

/** Shown where a value does not exist (no limit, no utilisation). */
export const NO_VALUE = '—';

/** Between a number and its unit, so the two never part at a line break. */
export const UNIT_SPACE = '\u00A0';

// Units whose values are counted, not measured: whole numbers.
const WHOLE = new Set(['count', 'spokes', 'pieces', 'wraps', 'turns']);
const LENGTH = new Set(['mm']);

function trimZero(text: string): string {
  // Trailing zeros after the point say nothing here (the figures are an upper bound), and "-0" reads as a real negative.
  // By hand, not by a pattern: every number of every message passes here.
  let end = text.length;
  if (text.includes('.')) {
    while (end > 0 && text.charCodeAt(end - 1) === 48) end--;
    // As /\.?0+$/ has it: the point goes only with the zeros after it.
    if (end < text.length && end > 0 && text.charCodeAt(end - 1) === 46) end--;
  }
  const t = end === text.length ? text : text.slice(0, end);
  return t === '-0' ? '0' : t;
}

/** A number in text, by its unit's rule; `—` for a value that is not finite. */
export function formatNumber(value: number | null | undefined, unit = '', sig = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return '0';
  if (WHOLE.has(unit)) return trimZero(Math.round(value).toString());
  const a = Math.abs(value);
  // Below a thousandth a fixed point would print nothing but zeros: write the exponent.
  if (a < 1e-3 && !LENGTH.has(unit)) {
    const [m, e] = value.toExponential(sig - 1).split('e');
    return `${trimZero(m)}e${Number(e)}`;
  }
  // Whole millimetres, rounded once (rounding to four figures first put 77.498 at 77.50 and then at 78); four figures from 10 m.
  if (LENGTH.has(unit) && a >= 10) return trimZero((a >= 10000 ? roundSig(value, 4) : value).toFixed(0));
  if (a >= 1000) return trimZero(roundSig(value, Math.max(sig, 4)).toFixed(0));
  const decimals = Math.max(0, sig - 1 - Math.floor(Math.log10(a)));
  return trimZero(value.toFixed(Math.min(decimals, LENGTH.has(unit) ? 1 : 6)));
}

function roundSig(v: number, sig: number): number {
  const p = Math.pow(10, sig - 1 - Math.floor(Math.log10(Math.abs(v))));
  return Math.round(v * p) / p;
}

/** A number with its unit: `1234 N`, `0.521 m/s²`; a plain ratio (unit '1' or '') has none. */
export function formatQuantity(value: number | null | undefined, unit: string, sig = 3): string {
  const text = formatNumber(value, unit, sig);
  if (text === NO_VALUE || unit === '' || unit === '1') return text;
  return `${text}${UNIT_SPACE}${unit}`;
}

/** A fraction as a percentage: 0.1234 gives `12.3 %`. */
export function formatPercent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return NO_VALUE;
  return `${formatNumber(fraction * 100)}${UNIT_SPACE}%`;
}
