import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'stock.siding';

describe(RULE, () => {
  it('advises where the siding is a mass only (the central-axle demo, 8 kg)', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('info');
    expect(f.code).toBe(2731);
    expect(f.value).toBe(8);
  });

  it('passes where extra parts are listed for it', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { extra_parts: [{ name: 'siding rail', species: 'white-ash', length_mm: 1000, width_mm: 30, thickness_mm: 25, quantity: 3 }] } });
    const [f] = await findingsOf(RULE, raw);
    expect(f.severity).toBe('info');
    expect(f.message).toContain('the 1 part under stock.extra_parts is in the cut list');
  });

  it('boundary: no siding (0 kg), nothing to say', async () => {
    expect(await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { box: { siding_mass_kg: 0 } }))).toEqual([]);
  });
});
