// A number rounded to a few significant digits, exactly as
// Number(v.toPrecision(digits)) rounds it, without making and parsing a
// string: the ride's plot series round tens of thousands of values a check.
// The decimal rounding is done in binary where it cannot differ from the
// exact one (the scaled value is at least a millionth of a unit from a
// rounding tie); the quotient or product by a power of ten is then correctly
// rounded, as parsing the decimal text is. Near a tie, and at magnitudes
// where ten to the power needed is not exact, it takes the string's way.

/** Powers of ten that a double holds exactly. */
const POW10 = Array.from({ length: 23 }, (_, i) => 10 ** i);

/** Scaled values this close to a rounding tie are left to toPrecision. */
const TIE_BAND = 1e-6;

export function roundSignificant(v: number, digits: number): number {
  if (v === 0) return 0; // toPrecision writes -0 as 0
  if (!Number.isFinite(v)) return v;
  const a = Math.abs(v);
  const places = digits - 1 - Math.floor(Math.log10(a));
  if (places <= 22 && places >= -22 && digits <= 15) {
    const x = places >= 0 ? a * POW10[places] : a / POW10[-places];
    let n = Math.floor(x);
    const f = x - n;
    if (f > 0.5) n++;
    // Near a tie the string decides; so it does where the logarithm's decade was off by one next to a power of ten,
    // or rounding up carried into the next decade.
    if (Math.abs(f - 0.5) >= TIE_BAND && n >= POW10[digits - 1] && n < POW10[digits]) {
      const r = places >= 0 ? n / POW10[places] : n * POW10[-places];
      return v < 0 ? -r : r;
    }
  }
  return Number(v.toPrecision(digits));
}
