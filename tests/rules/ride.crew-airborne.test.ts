import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'ride.crew-airborne';

describe(RULE, () => {
  it('passes when the crew stay on the floor over the demo track', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found).toHaveLength(4); // two crew, two road cases
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    expect(found[0].working_text).toContain('Runge-Kutta');
    expect(found[0].working_text).toContain('from memory');
  });

  it('fails when a 40 mm ridge throws the crew off the floor', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 40 } }));
    const ridge = found.filter((f) => f.subject.includes('ridge'));
    expect(ridge.every((f) => f.severity === 'fail')).toBe(true);
    expect(ridge[0].value!).toBeGreaterThan(20);
    expect(ridge[0].message).toContain('leaves the floor');
  });

  it('boundary: a time off the floor equal to the limit passes, a hair less fails', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { operation: { bump_height_mm: 20 } });
    const probe = (await findingsOf(RULE, raw)).reduce((w, f) => (f.value! > w.value! ? f : w));
    expect(probe.value!).toBeGreaterThan(0);
    const at = (await findingsOf(RULE, raw, { max_airborne_ms: probe.value!, max_rise_mm: 1e3 })).find((f) => f.subject === probe.subject)!;
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, raw, { max_airborne_ms: probe.value! * (1 - 1e-9), max_rise_mm: 1e3 })).find((f) => f.subject === probe.subject)!;
    expect(over.severity).toBe('fail');
  });
});
