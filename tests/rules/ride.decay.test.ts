import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const RULE = 'ride.decay';
const lively = (zeta: number) => deepMerge(readDemo('demo-two-crew'), { floor_straps: { measured: { damping_ratio: zeta, source: 'test floor' } } });

describe(RULE, () => {
  it('passes with the default floor damping', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('ride.drop');
    expect(f.load_case).toBe('drop');
    expect(f.value!).toBeGreaterThan(1);
    expect(f.value!).toBeLessThan(3);
    expect(f.limit).toBe(3);
    // 10 % of the first amplitude (rules/parameters/ride.yaml), printed as a percentage.
    expect(f.params.fraction).toBe(0.1);
    expect(f.message).toContain('below 10\u00a0% of its first amplitude');
    expect(f.sources).toEqual(expect.arrayContaining(['common-practice', 'design-basis-ride']));
  });

  it('works out the damping a linear single-degree system needs for the cycles allowed', async () => {
    // Closed form (design basis, section 8): delta = ln(1/0.1) / 3 = 0.76753, zeta = delta / sqrt(4 pi^2 + delta^2) = 0.1213.
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    const zeta = f.working.find((s) => s.formula.startsWith('it needs ζ'))!.result!;
    expect(zeta).toBeCloseTo(0.1213, 4);
  });

  it('warns for a lightly damped measured floor, naming the damping that would do', async () => {
    const [f] = await findingsOf(RULE, lively(0.07));
    expect(f.severity).toBe('warning');
    expect(f.code).toBe(2812);
    expect(f.value!).toBeGreaterThan(3);
    expect(f.fix).toMatch(/floor damping ratio of 0\.\d+ would meet/);
    expect(f.message).toContain('0.07');
    expect(f.working_text).toContain('tuner:');
  });

  it('warns where the motion never falls below the fraction within the run', async () => {
    const [f] = await findingsOf(RULE, lively(0.02));
    expect(f.severity).toBe('warning');
    expect(f.code).toBe(2813);
    expect(f.value).toBeNull();
    expect(f.message).toContain('0.02');
    expect(f.fix).toMatch(/floor damping ratio of 0\.\d+ would meet/);
  });

  it('reads the decay fraction from the model parameters', async () => {
    // A looser fraction (30 % of the first amplitude) is reached in fewer cycles.
    const [tight] = await findingsOf(RULE, readDemo('demo-two-crew'));
    const [loose] = await findingsOf(RULE, readDemo('demo-two-crew'), {}, withParams('ride.inputs', { decay_fraction: 0.3 }));
    expect(loose.params.fraction).toBe(0.3);
    expect(loose.value!).toBeLessThan(tight.value!);
  });

  it('boundary: cycles equal to the limit pass, a hair above the value warns', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [at] = await findingsOf(RULE, raw, { 'cycles.hard': probe.value! });
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { 'cycles.hard': probe.value! * (1 - 1e-9) });
    expect(over.severity).toBe('warning');
  });

  it('says so, and does not pass, where the ride model was not run (a statics-only run)', () => {
    const rule = RULES.find((r) => r.id === RULE)!;
    const spec = prepared(readDemo('demo-two-crew'));
    const found = runRules([rule], spec, rulesData, new Analysis(spec, rulesData, undefined, { ride: false }));
    expect(found.map((f) => [f.severity, f.code])).toEqual([['advice', 2814]]);
  });
});
