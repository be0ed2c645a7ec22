import { describe, expect, it } from 'vitest';
import { findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.wheel-load';

describe(RULE, () => {
  it('notes the wheel loads of the design turn', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.value!).toBeGreaterThan(0.1);
    expect(f.utilisation!).toBeCloseTo(0.1 / f.value!, 12);
    expect(f.value!).toBeLessThan(1);
  });

  it('warns when the inner wheel lifts', async () => {
    const [f] = await findingsOf(RULE, readDemo('teaching-flawed'));
    expect(f.severity).toBe('warning');
    expect(f.value!).toBeLessThan(0);
    expect(f.message).toContain('lifts');
  });

  it('boundary: an inner share equal to the limit passes, a hair below warns', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [f] = await findingsOf(RULE, raw, { 'inner_share.hard': probe.value! });
    expect(f.severity).toBe('pass');
    const [g] = await findingsOf(RULE, raw, { 'inner_share.hard': probe.value! + 1e-9 });
    expect(g.severity).toBe('warning');
  });
});
