import { describe, expect, it } from 'vitest';
import { roundSignificant } from '../src/core/numeric/round-significant.ts';

// Against the language's own decimal rounding, Number(v.toPrecision(d))
// (ECMA-262, Number.prototype.toPrecision), value for value and bit for bit:
// random values over every magnitude, exact binary ties, values next to
// powers of ten, and the special values. The generator is a fixed linear
// congruential sequence, so the test sees the same values every run.

function* values(): Generator<number> {
  let s = 12345;
  const next = () => (s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 2 ** 32;
  for (let i = 0; i < 200_000; i++) {
    const mag = 10 ** Math.floor(next() * 44 - 22);
    yield (next() - 0.5) * 20 * mag;
  }
  // Exact binary ties at five and nine digits (x.5 in the last place), and their neighbours.
  for (let k = 0; k < 2000; k++) for (const t of [12344.5, 1.5, 0.125, 2.03125, 99999.5, 1234567.5]) for (const d of [-1, 0, 1]) yield (t + k) * 2 ** (d * (k % 7));
  for (let p = -20; p <= 20; p++) for (const d of [-2, -1, 0, 1, 2]) yield 10 ** p + d * Number.EPSILON * 10 ** p;
  yield* [0, -0, NaN, Infinity, -Infinity, Number.MIN_VALUE, Number.MAX_VALUE, 5e-324, 1e-300, 1e300];
}

describe('rounding to significant digits', () => {
  for (const digits of [5, 9]) {
    it(`gives what Number(v.toPrecision(${digits})) gives`, () => {
      let checked = 0;
      for (const v of values()) {
        const want = Number(v.toPrecision(digits));
        const got = roundSignificant(v, digits);
        if (!Object.is(got, want)) expect({ v, got }).toEqual({ v, got: want });
        checked++;
      }
      expect(checked).toBeGreaterThan(200_000);
    });
  }
});
