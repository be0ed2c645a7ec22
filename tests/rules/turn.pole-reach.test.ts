import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.pole-reach';
// demo-two-crew: axle at 235 mm, yoke at 2950 mm: reach L = 2.715 m

describe(RULE, () => {
  it('passes for a 15 m turn', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    // The value is the margin R_y − L against a least margin of 0 m (a minimum: utilisation is limit over value).
    expect(f.value).toBeCloseTo(15 - 2.715, 12);
    expect(f.limit).toBe(0);
    expect(f.params.reach as number).toBeCloseTo(2.715, 12);
    // R_a = sqrt(15^2 - 2.67^2) (design basis, section 4)
    expect(f.working.find((s) => s.formula.startsWith('axle path radius'))!.result!).toBeCloseTo(Math.sqrt(225 - 2.715 ** 2), 12);
  });

  it('fails for a turn inside the pole reach', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 2.5 } }));
    expect(f.severity).toBe('fail');
    expect(f.message).toContain('too tight');
  });

  it('boundary: a yoke path equal to the reach plus the margin has no steady turn', async () => {
    // A margin equal to the limit is within it (equal is within); a hair less fails.
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 3.725 } }), { 'margin_m.hard': 1.01 });
    expect(f.value).toBeCloseTo(1.01, 12);
    const [g] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 3.725 } }), { 'margin_m.hard': 1.011 });
    expect(g.severity).toBe('fail');
    const [h] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 3.725 } }), { 'margin_m.hard': 1.009 });
    expect(h.severity).toBe('pass');
    expect(h.utilisation!).toBeCloseTo(1.009 / (3.725 - 2.715), 9);
  });
});
