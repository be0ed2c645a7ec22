import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'stock.siding';

describe(RULE, () => {
  it('notes where the siding is a mass only (the central-axle demo, 8 kg)', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('info');
    expect(f.code).toBe(2731);
    expect(f.subject).toBe('box.siding');
    expect(f.value).toBe(8);
    expect(f.message).toContain('only as a mass (8\u00a0kg)');
  });

  it('notes where extra parts are listed for it', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { extra_parts: [{ name: 'siding rail', species: 'white-ash', length_mm: 1000, width_mm: 30, thickness_mm: 25, quantity: 3 }] } });
    const [f] = await findingsOf(RULE, raw);
    expect(f.severity).toBe('info');
    expect(f.code).toBe(2732);
    expect(f.params.count).toBe(1);
    expect(f.message).toContain('the entries under stock.extra_parts (1) are in the cut list');
    expect(f.working_text).toContain('siding rail: 3 × 1000 × 30 × 25 mm white-ash');
  });

  it('boundary: no siding (0 kg), nothing to say; the least siding is noted', async () => {
    expect(await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { box: { siding_mass_kg: 0 } }))).toEqual([]);
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { box: { siding_mass_kg: 0.001 } }));
    expect(f.code).toBe(2731);
  });
});
