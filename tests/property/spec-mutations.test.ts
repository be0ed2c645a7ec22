// Property tests over mutated specifications (the demos and validation specs
// with keys removed, entries duplicated, values extreme, of the wrong type or
// unit, or huge): the check never throws past the top level, a refused input
// gives located issues (exit 2), an accepted one gives a verdict that exits 0
// or 1 (never an error: exit 3), and no number in the result is NaN or
// Infinity. Seeded, so a failure repeats; `npm run fuzz` runs many more cases
// as whole processes.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { rulesData } from '../support/fixtures.ts';
import { caseArb, mutated, nonFinite } from '../support/spec-mutations.ts';

describe('mutated specifications', () => {
  it('are refused with located issues or checked to a verdict with finite numbers, never a fault', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const p = prepareSpec(mutated(c), rulesData);
        if (!p.ok) {
          expect(p.issues.length).toBeGreaterThan(0);
          for (const i of p.issues) expect(i.message.length).toBeGreaterThan(0);
          return;
        }
        // Statics only here: the ride cases run in the fuzz script, where time allows.
        const r = runCheck(p.spec, p.entries, rulesData, { ride: false });
        expect(r.verdict).not.toBe('error');
        expect(nonFinite(r)).toEqual([]);
      }),
      { seed: 20261203, numRuns: 120 },
    );
  }, 120_000);
});
