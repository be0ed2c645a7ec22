import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { WORK_LIMIT } from '../../src/core/decisive/decisive-inputs.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { checkWithWorkLimit } from '../../src/core/review/check-with-work-limit.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { rulesData } from '../support/fixtures.ts';

// The batch's check with a work limit of its own is the single check when
// given the single check's limit (the reference is runCheck itself), and a
// smaller limit is recorded and kept to.

function preparedOf(path: string) {
  const p = prepareSpec(parse(readFileSync(new URL(`../../specs/${path}.yaml`, import.meta.url), 'utf8')), rulesData);
  if (!p.ok) throw new Error(`${path} does not prepare`);
  return p;
}

describe('a check with the decisive search held to a work limit', () => {
  it('equals the single check at the single check’s limit, key order included', () => {
    // A validation build whose search is short (a few dozen re-runs) yet finds break-even values.
    const { spec, entries } = preparedOf('validation/trade-light-two-crew');
    const single = runCheck(spec, entries, rulesData, { decisive: true });
    const limited = checkWithWorkLimit(spec, entries, rulesData, { workLimit: WORK_LIMIT });
    expect(single.decisive_inputs!.some((d) => d.break_even !== null)).toBe(true);
    expect(JSON.stringify(limited)).toBe(JSON.stringify(single));
  });

  it('keeps to a smaller limit and says which it used', () => {
    const { spec, entries } = preparedOf('demo-two-crew');
    const limited = checkWithWorkLimit(spec, entries, rulesData, { workLimit: 60 });
    expect(limited.decisive_search).toMatchObject({ work_limit: 60 });
    // The demo's full search does about 760 units of work (its result.json): at 60 most pairs are left, and say so.
    expect(limited.decisive_search!.unsearched).toBeGreaterThan(0);
    expect(limited.decisive_inputs!.some((d) => d.reason === 'not searched: the work limit of the search was reached')).toBe(true);
    expect(limited.findings).toEqual(runCheck(spec, entries, rulesData).findings);
  });
});
