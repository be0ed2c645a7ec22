import { describe, expect, it } from 'vitest';
import { breakEven, TOLERANCE, type Outcome } from '../../src/core/decisive/break-even.ts';
import type { InputRange } from '../../src/core/decisive/input-range.ts';

// A closed form to search: a demand 2·v against levels 10 (advisory) and 14 (hard), graded as the rules grade a maximum.
const graded = (v: number): Outcome => {
  const x = 2 * v;
  return { severity: x > 14 ? 'fail' : x > 10 ? 'warning' : 'pass', gap: x / 10 - 1 };
};
const range = (low: number, high: number, integer = false): InputRange => ({ low, high, integer, text: 'the test range' });

describe('break-even search', () => {
  it('finds where a linear demand crosses the advisory level, to the tolerance (closed form: v = 10 / 2 = 5)', () => {
    const be = breakEven(3, graded(3), range(0.3, 30), graded, 'x');
    expect(be.break_even).not.toBeNull();
    if (be.break_even === null) return;
    expect(Math.abs(be.break_even - 5)).toBeLessThanOrEqual(TOLERANCE * 5);
    expect(be.to_severity).toBe('warning');
    // The value one per cent either side straddles the change.
    expect(graded(be.break_even * 0.99).severity).toBe('pass');
    expect(graded(be.break_even * 1.01).severity).toBe('warning');
  });

  it('searches downwards from a failing value to where it stops failing (v = 14 / 2 = 7)', () => {
    const be = breakEven(9, graded(9), range(0.9, 90), graded, 'x');
    if (be.break_even === null) throw new Error(be.reason);
    expect(Math.abs(be.break_even - 7)).toBeLessThanOrEqual(TOLERANCE * 7);
    expect(be.to_severity).toBe('warning');
  });

  it('without a guiding gap (a step function), the ladder and halving still find it', () => {
    const step = (v: number): Outcome => ({ severity: v > 4.2 ? 'fail' : 'pass', gap: null });
    const be = breakEven(2, step(2), range(0.2, 20), step, 'x');
    if (be.break_even === null) throw new Error(be.reason);
    expect(Math.abs(be.break_even - 4.2)).toBeLessThanOrEqual(TOLERANCE * 4.2);
  });

  it('an integer input gives the first whole value at which the severity changes', () => {
    const spokes = (n: number): Outcome => ({ severity: 1200 / n > 150 ? 'fail' : 'pass', gap: 1200 / n / 150 - 1 });
    const be = breakEven(6, spokes(6), range(3, 24, true), spokes, 'x');
    // 1200 / n <= 150 from n = 8.
    expect(be).toEqual({ break_even: 8, to_severity: 'pass' });
  });

  it('says so where no value in range changes the severity', () => {
    const flat = (): Outcome => ({ severity: 'pass', gap: -0.5 });
    const be = breakEven(1, flat(), range(0.1, 10), flat, 'a tenth to ten times');
    expect(be).toEqual({ break_even: null, reason: 'no value within a tenth to ten times changes the severity' });
  });

  it('treats values the check refuses as the end of the range', () => {
    const refusing = (v: number): Outcome | null => (v > 3 ? null : { severity: 'pass', gap: v / 10 - 1 });
    const be = breakEven(2, { severity: 'pass', gap: -0.8 }, range(0.2, 20), refusing, 'r');
    expect(be.break_even).toBeNull();
  });
});
