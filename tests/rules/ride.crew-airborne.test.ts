import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'ride.crew-airborne';

describe(RULE, () => {
  it('passes when the crew stay on the floor over the demo track', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found).toHaveLength(4); // two crew, two road cases
    expect(found.map((f) => [f.subject, f.load_case])).toEqual([
      ['crew.0.ridge', 'ridge'],
      ['crew.1.ridge', 'ridge'],
      ['crew.0.one-wheel', 'one-wheel'],
      ['crew.1.one-wheel', 'one-wheel'],
    ]);
    expect(found[0].subject_label).toBe('driver, ridge across both tracks');
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    expect(found[0].working_text).toContain('Runge-Kutta');
    // The limits and the model's stiffnesses are from memory (rules/limits/ride.yaml, rules/parameters/ride.yaml).
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-ride', 'from-memory']));
  });

  it('fails when a 40 mm ridge throws the crew off the floor', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } }));
    const ridge = found.filter((f) => f.load_case === 'ridge');
    expect(ridge.every((f) => f.severity === 'fail')).toBe(true);
    expect(ridge[0].params.airborne as number).toBeGreaterThan(20);
    expect(ridge[0].message).toContain('leaves the floor');
  });

  /**
   * Boundary of one measure: with the other limit out of the way, a limit
   * equal to the largest value passes, a hair below it fails.
   */
  async function boundary(bump_height_mm: number, measure: 'airborne' | 'lift', limit: string, other: string, unit: string) {
    const raw = deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm } });
    const probe = (await findingsOf(RULE, raw)).reduce((w, f) => ((f.params[measure] as number) > (w.params[measure] as number) ? f : w));
    const v = probe.params[measure] as number;
    expect(v).toBeGreaterThan(0);
    const pick = async (limits: Record<string, number>) => (await findingsOf(RULE, raw, limits)).find((f) => f.subject === probe.subject)!;
    const at = await pick({ [`${limit}.hard`]: v, [`${other}.hard`]: 1e3 });
    expect(at.severity).toBe('pass');
    // The measure governs: the value is it, against its own limit.
    expect([at.value, at.limit, at.unit]).toEqual([v, v, unit]);
    const over = await pick({ [`${limit}.hard`]: v * (1 - 1e-9), [`${other}.hard`]: 1e3 });
    expect(over.severity).toBe('fail');
  }

  it('boundary: a time off the floor equal to the limit passes, a hair less fails', () => boundary(20, 'airborne', 'airborne_ms', 'rise_mm', 'ms'));

  it('boundary: a rise above the floor equal to the limit passes, a hair less fails', () => boundary(30, 'lift', 'rise_mm', 'airborne_ms', 'mm'));

  it('says so, and does not pass, where the ride model was not run (a statics-only run)', () => {
    const rule = RULES.find((r) => r.id === RULE)!;
    const spec = prepared(readDemo('demo-two-crew'));
    const found = runRules([rule], spec, rulesData, new Analysis(spec, rulesData, undefined, { ride: false }));
    expect(found.map((f) => [f.severity, f.code, f.subject])).toEqual([['advice', 2804, 'ride.model']]);
  });
});
