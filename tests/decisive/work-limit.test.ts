import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { WORK_LIMIT } from '../../src/core/decisive/decisive-inputs.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { rulesData } from '../support/fixtures.ts';

// A check with the decisive search held to a smaller work limit (a batch's)
// keeps to it, says which it used, and leaves the findings as they were.

function preparedOf(path: string) {
  const p = prepareSpec(parse(readFileSync(new URL(`../../specs/${path}.yaml`, import.meta.url), 'utf8')), rulesData);
  if (!p.ok) throw new Error(`${path} does not prepare`);
  return p;
}

describe('a check with the decisive search held to a work limit', () => {
  it('uses the single check\'s limit when given none', () => {
    const { spec, entries } = preparedOf('validation/trade-light-two-crew');
    expect(runCheck(spec, entries, rulesData, { decisive: true }).decisive_search).toMatchObject({ work_limit: WORK_LIMIT });
  });

  it('keeps to a smaller limit and says which it used', () => {
    const { spec, entries } = preparedOf('demo-two-crew');
    const limited = runCheck(spec, entries, rulesData, { decisive: true, decisiveWorkLimit: 60 });
    expect(limited.decisive_search).toMatchObject({ work_limit: 60 });
    // The demo's full search does about 760 units of work (its result.json): at 60 most pairs are left, and say so.
    expect(limited.decisive_search!.unsearched).toBeGreaterThan(0);
    expect(limited.decisive_inputs!.some((d) => d.reason === 'not searched: the work limit of the search was reached')).toBe(true);
    expect(limited.findings).toEqual(runCheck(spec, entries, rulesData).findings);
  });
});
