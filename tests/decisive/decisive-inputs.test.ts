import { describe, expect, it } from 'vitest';
import { withInput } from '../../src/core/decisive/input-path.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { specKey, dataKey } from '../../src/core/decisive/recording-proxy.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';
import type { DecisiveInput } from '../../src/core/decisive/decisive-input.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

// The decisive inputs found by partial re-runs agree with a whole, fresh check
// at the break-even value plus and minus one per cent: the severity changes
// between them (the acceptance test; the re-run is the reference).

const prepared = prepareSpec(readDemo('demo-two-crew'), rulesData);
if (!prepared.ok) throw new Error('demo does not prepare');
const { spec, entries } = prepared;
const result = runCheck(spec, entries, rulesData, { decisive: true });

/** The input's key back from its printed address. */
function keyOf(d: DecisiveInput): string {
  if (d.origin === 'spec') return specKey(d.input.split('.'));
  const [file, path] = d.input.split('#');
  const [table, group, ...rest] = (() => {
    if (file.startsWith('rules/limits/')) {
      const parts = path.split('.');
      // a rule id holds one dot: family.name
      return ['limits', `${parts[0]}.${parts[1]}`, ...parts.slice(2)];
    }
    if (file.startsWith('rules/parameters/')) {
      const group = Object.keys(rulesData.params).find((g) => path.startsWith(`${g}.`))!;
      return ['params', group, ...path.slice(group.length + 1).split('.')];
    }
    const table = file.endsWith('species.yaml') ? 'species' : file.endsWith('leathers.yaml') ? 'leathers' : 'grounds';
    return [table, ...path.split('.')];
  })();
  return dataKey([table, group, ...rest, 'value']);
}

function severityAt(d: DecisiveInput, v: number): string | undefined {
  const changed = withInput(keyOf(d), v, spec, rulesData);
  const r: CheckResult = runCheck(changed.spec, entries, changed.data);
  return r.findings.find((f) => f.rule === d.rule && f.subject === d.subject)?.severity;
}

describe('decisive inputs of the central-axle demo', () => {
  it('lists, for each of the three highest utilisations, inputs with their status and break-even', () => {
    const list = result.decisive_inputs!;
    expect(result.decisive_search!.findings).toBe(3);
    expect(new Set(list.map((d) => d.rule)).size).toBeGreaterThanOrEqual(2);
    for (const d of list) {
      expect(['given', 'defaulted', 'from-memory']).toContain(d.status);
      expect(d.break_even === null).toBe(d.reason !== undefined);
      if (d.break_even !== null) expect(d.change).toBeCloseTo(d.break_even / d.value - 1, 12);
    }
    expect(list.some((d) => d.origin === 'data')).toBe(true);
    expect(list.some((d) => d.origin === 'spec')).toBe(true);
  });

  it('each break-even agrees with a fresh whole check one per cent either side', () => {
    const withValue = result.decisive_inputs!.filter((d) => d.break_even !== null);
    expect(withValue.length).toBeGreaterThanOrEqual(3);
    // One per finding, so the three rules are each confirmed.
    const one = [...new Map(withValue.map((d) => [d.rule, d])).values()];
    for (const d of one) {
      const be = d.break_even!;
      const below = severityAt(d, be * (be > d.value ? 0.99 : 1.01));
      const beyond = severityAt(d, be * (be > d.value ? 1.01 : 0.99));
      expect(below, `${d.rule} ${d.input} short of ${be}`).toBe(d.severity);
      expect(beyond, `${d.rule} ${d.input} past ${be}`).toBe(d.to_severity);
    }
  }, 120_000);
});

describe('an input read only through the ride model', () => {
  // The ride's input carries the spec and data it was built from; a trial that
  // reused it would run the ride on the old values, and the break-even of the
  // routine bump's size would be wrong. The reference is a fresh whole check.
  it('the bump size break-evens agree with a fresh whole check one per cent either side', () => {
    const bump = result.decisive_inputs!.filter((d) => d.break_even !== null && /rough_ground\.(height|length)_mm$/.test(d.input));
    expect(bump.length).toBeGreaterThanOrEqual(1);
    for (const d of bump) {
      const be = d.break_even!;
      expect(severityAt(d, be * (be > d.value ? 0.99 : 1.01)), `${d.input} short of ${be}`).toBe(d.severity);
      expect(severityAt(d, be * (be > d.value ? 1.01 : 0.99)), `${d.input} past ${be}`).toBe(d.to_severity);
    }
  }, 120_000);
});
