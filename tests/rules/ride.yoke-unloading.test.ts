import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'ride.yoke-unloading';

describe(RULE, () => {
  it('passes when the pole rests heavily on the yoke', async () => {
    const found = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(found).toHaveLength(2);
    expect(found.every((f) => f.severity === 'pass' && f.value! > 0)).toBe(true);
  });

  it('warns when the central axle\'s light pole load swings below zero over a ridge', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } }));
    const ridge = found.find((f) => f.subject.includes('ridge'))!;
    expect(ridge.severity).toBe('warning');
    expect(ridge.value!).toBeLessThan(0);
    expect(ridge.working_text).toContain('standing');
  });

  it('boundary: a least yoke force equal to the limit passes, a hair above it warns', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [at] = await findingsOf(RULE, raw, { lift_N: probe.value! });
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { lift_N: probe.value! * (1 + 1e-9) });
    expect(over.severity).toBe('warning');
  });
});
