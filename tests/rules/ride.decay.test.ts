import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'ride.decay';
const lively = (zeta: number) => deepMerge(readDemo('demo-two-crew'), { floor_straps: { measured: { damping_ratio: zeta, source: 'test floor' } } });

describe(RULE, () => {
  it('passes with the default floor damping', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.value!).toBeGreaterThan(1);
    expect(f.value!).toBeLessThan(3);
  });

  it('warns for a lightly damped measured floor, naming the damping that would do', async () => {
    const [f] = await findingsOf(RULE, lively(0.05));
    expect(f.severity).toBe('warning');
    expect(f.message).toMatch(/floor damping ratio of 0\.\d+ would meet/);
    expect(f.message).toContain('0.05');
  });

  it('boundary: cycles equal to the limit pass, a hair above the value warns', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [at] = await findingsOf(RULE, raw, { max_cycles: probe.value! });
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { max_cycles: probe.value! * (1 - 1e-9) });
    expect(over.severity).toBe('warning');
  });
});
