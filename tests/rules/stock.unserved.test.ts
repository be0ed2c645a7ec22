import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';
import { THREE_STOCKS } from '../support/three-stocks.ts';

const RULE = 'stock.unserved';

describe(RULE, () => {
  it('notes on the central-axle demo that the frame rails and naves are larger than the listed sections', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), THREE_STOCKS));
    expect(found.map((f) => [f.subject_label, f.severity, f.code])).toEqual([
      ['floor frame front rail, bent, with the sides', 'info', 2702],
      ['floor frame rear rail', 'info', 2702],
      ['nave', 'info', 2702],
    ]);
    expect(found[1].subject).toBe('part.floor-frame-rear-rail');
    // Rail 80 × 45 + 3 mm a face = 86 × 51 against the 75 × 75 listed.
    expect(found[1].params).toMatchObject({ width: 86, thickness: 51, species: 'white-ash' });
    expect(found[1].message).toContain('no listed white-ash section holds its rough section of 86 × 51\u00a0mm');
    expect(found[1].working_text).toContain('listed white-ash 75 × 75 mm in 2400, 3000, 3600 mm: too small in section');
    expect(found[0].message).toContain('straight-grained and free of knots and run-out for steam bending');
    expect(found[1].message).not.toContain('steam bending');
  });

  it('gives one note per species with no stock listed (the rear-axle demo lists none)', async () => {
    const found = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(found.map((f) => f.subject)).toEqual(['stock.white-ash', 'stock.shagbark-hickory', 'stock.white-oak', 'stock.rock-elm']);
    expect(found.every((f) => f.severity === 'info' && f.code === 2701)).toBe(true);
    expect(found[1].message).toBe('No shagbark-hickory stock is listed, so axle, linchpin cannot be planned: list it under stock.lumber, or buy the sizes the working gives.');
    expect(found[1].working_text).toContain('for the axle: shagbark-hickory at least 78 × 78 mm in section and 2108 mm long, 1 piece');
  });

  it('notes once every part has stock', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), {
      stock: {
        lumber: [
          { species: 'white-ash', width_mm: 100, thickness_mm: 75, lengths_mm: [2400, 3600], price_per_m3: 1350 },
          { species: 'rock-elm', width_mm: 175, thickness_mm: 175, lengths_mm: [2400], price_per_m3: 1500 },
          { species: 'white-oak', width_mm: 75, thickness_mm: 75, lengths_mm: [1800], price_per_m3: 1600 },
        ],
      },
    });
    const found = await findingsOf(RULE, raw);
    expect(found.map((f) => [f.severity, f.code, f.subject])).toEqual([['info', 2704, 'stock']]);
    expect(found[0].params.groups).toBe(3);
  });

  it('boundary: a part as long as the longest listed length is served, a millimetre longer is not', async () => {
    // The yoke is 1150 mm finished, 1200 mm rough (25 mm an end): white oak 75 × 75 listed in 1200 mm, then 1199 mm.
    const withOak = (length: number) => deepMerge(readDemo('demo-two-crew'), { stock: { lumber: [{ species: 'white-oak', width_mm: 75, thickness_mm: 75, lengths_mm: [length] }] } });
    const yoke = async (length: number) => (await findingsOf(RULE, withOak(length))).find((f) => f.subject === 'part.yoke');
    expect(await yoke(1200)).toBeUndefined();
    const over = (await yoke(1199))!;
    expect(over.code).toBe(2703);
    expect(over.value).toBe(1200);
    expect(over.params.longest).toBe(1199);
    expect(over.message).toContain('its rough length of 1200\u00a0mm is longer than any listed white-oak length of a section that holds it (the longest is 1199\u00a0mm)');
  });
});
