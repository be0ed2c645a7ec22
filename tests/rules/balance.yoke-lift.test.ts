import { describe, expect, it } from 'vitest';
import { findingsOf, readDemo, deepMerge } from '../support/fixtures.ts';

const RULE = 'balance.yoke-lift';

describe(RULE, () => {
  it('passes when the axle is under the rear edge (the crew always ahead of it)', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(f.severity).toBe('pass');
    expect(f.value!).toBeGreaterThan(100);
  });

  it('fails when the axle stands ahead of the crew at the back of the floor', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { axle: { x_mm: 520 } }));
    expect(f.severity).toBe('fail');
    expect(f.value!).toBeLessThan(0);
    expect(f.working_text).toContain('R_pole =');
    expect(f.subject_label).toContain('back of the usable floor');
    expect(f.subject).toBe(`case.${f.load_case}`);
    expect(f.params.lift as number).toBeCloseTo(-f.value!, 12);
  });

  it('boundary: a least pole load equal to the lift limit does not lift', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const v = probe.value!;
    const [atLimit] = await findingsOf(RULE, raw, { 'pole_load.hard': v, 'pole_load.advisory': v });
    expect(atLimit.severity).toBe('pass');
    const [justOver] = await findingsOf(RULE, raw, { 'pole_load.hard': v + 1e-6 * Math.abs(v) + 1e-9, 'pole_load.advisory': v + 1 });
    expect(justOver.severity).toBe('fail');
  });

  it('gives advice when the yoke only just rests on the necks', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'), { 'pole_load.advisory': 1e6 });
    expect(f.severity).toBe('advice');
    expect(f.message_key).toBe('light');
    // A minimum limit: utilisation is limit over value (the hard level, 0 N, gives no scale).
    expect(f.utilisation).toBeNull();
  });
});
