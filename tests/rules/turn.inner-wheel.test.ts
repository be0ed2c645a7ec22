import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.inner-wheel';
// demo-two-crew: reach L = 2.715 m, track 1.640 m

describe(RULE, () => {
  it('passes when both wheels roll forward', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.value).toBeCloseTo(Math.sqrt(225 - 2.715 ** 2) - 0.82, 9);
  });

  it('warns when the inner wheel runs backwards', async () => {
    // R_a = sqrt(2.75^2 - 2.715^2) = 0.437 m < t/2 = 0.82 m
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 2.75 } }));
    expect(f.severity).toBe('warning');
    expect(f.value).toBeCloseTo(Math.sqrt(2.75 ** 2 - 2.715 ** 2) - 0.82, 9);
    expect(f.working_text).toContain('ratio = R_inner / R_outer');
  });

  it('boundary: an inner radius equal to the limit passes', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const [f] = await findingsOf(RULE, raw, { 'inner_radius_m.hard': probe.value! });
    expect(f.severity).toBe('pass');
    const [g] = await findingsOf(RULE, raw, { 'inner_radius_m.hard': probe.value! + 1e-9 });
    expect(g.severity).toBe('warning');
  });

  it('says nothing when there is no steady turn (turn.pole-reach fails instead)', async () => {
    expect(await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 2 } }))).toEqual([]);
  });
});
