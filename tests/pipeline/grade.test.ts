import { describe, expect, it } from 'vitest';
import type { ResolvedLimit } from '../../src/core/pipeline/define-rule.ts';
import { grade } from '../../src/core/pipeline/grade.ts';

// Severity and utilisation of a value against a limit's levels. Utilisation is
// demand over capacity; for a minimum, limit over value (a value at or below
// zero has none). Equal to a level is within it.
const lim = (advisory: number | null, hard: number | null, direction: 'max' | 'min'): ResolvedLimit => ({ name: 'x', unit: 'N', direction, advisory, hard, sources: [] });

describe('grading against a limit', () => {
  it('a maximum: pass, warning beyond the advisory level, fail beyond the hard one', () => {
    const l = lim(80, 100, 'max');
    expect(grade(79, l, { direction: 'max', unit: 'N' })).toMatchObject({ severity: 'pass', limit: 100, utilisation: 0.79 });
    expect(grade(80, l, { direction: 'max', unit: 'N' }).severity).toBe('pass');
    expect(grade(80.0001, l, { direction: 'max', unit: 'N' }).severity).toBe('warning');
    expect(grade(100, l, { direction: 'max', unit: 'N' })).toMatchObject({ severity: 'warning', utilisation: 1 });
    expect(grade(100.0001, l, { direction: 'max', unit: 'N' }).severity).toBe('fail');
  });

  it('a minimum: utilisation is limit over value, never negative', () => {
    const l = lim(null, 2, 'min');
    expect(grade(4, l, { direction: 'min', unit: 'N' })).toMatchObject({ severity: 'pass', utilisation: 0.5 });
    expect(grade(2, l, { direction: 'min', unit: 'N' })).toMatchObject({ severity: 'pass', utilisation: 1 });
    expect(grade(1, l, { direction: 'min', unit: 'N' })).toMatchObject({ severity: 'fail', utilisation: 2 });
    expect(grade(-3, l, { direction: 'min', unit: 'N' })).toMatchObject({ severity: 'fail', utilisation: null });
  });

  it('levels scale with a capacity, and the severity each level gives can be set', () => {
    const l = lim(0.8, 1, 'max');
    const g = grade(9, l, { direction: 'max', unit: 'MPa', levels: { advisory: 'advice', hard: 'warning' } }, 10);
    expect(g).toMatchObject({ severity: 'advice', limit: 10, advisory: 8, hard: 10, utilisation: 0.9 });
    expect(grade(11, l, { direction: 'max', unit: 'MPa', levels: { hard: 'warning' } }, 10).severity).toBe('warning');
  });

  it('a zero limit gives no utilisation; a negative demand on a maximum counts as none', () => {
    expect(grade(5, lim(null, 0, 'max'), { direction: 'max', unit: 'N' })).toMatchObject({ severity: 'fail', utilisation: null });
    expect(grade(-5, lim(null, 10, 'max'), { direction: 'max', unit: 'N' }).utilisation).toBe(0);
  });
});
