import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.pole-reach';
// demo-two-crew: axle at 280 mm, yoke at 2950 mm: reach L = 2.670 m

describe(RULE, () => {
  it('passes for a 15 m turn', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.limit).toBeCloseTo(2.67, 12);
    // R_a = sqrt(15^2 - 2.67^2) (mechanics note, section 4)
    expect(f.working).toContain(`= ${Math.sqrt(225 - 2.67 ** 2).toFixed(3)} m`);
  });

  it('fails for a turn inside the pole reach', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 2.5 } }));
    expect(f.severity).toBe('fail');
    expect(f.message).toContain('too tight');
  });

  it('boundary: a yoke path equal to the reach plus the margin has no steady turn', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 3.67 } }), { least_margin_m: 1.0 });
    expect(f.value).toBe(3.67);
    expect(f.severity).toBe('fail');
    const [g] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { turn_radius_m: 3.68 } }), { least_margin_m: 1.0 });
    expect(g.severity).toBe('pass');
  });
});
