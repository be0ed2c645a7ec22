import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';
import { THREE_STOCKS } from '../support/three-stocks.ts';

const RULE = 'stock.plan';

describe(RULE, () => {
  it('notes one plan per species and section of the central-axle demo', async () => {
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), THREE_STOCKS));
    expect(found.map((f) => [f.subject, f.subject_label, f.severity])).toEqual([
      ['stock.rock-elm.100x100', 'rock-elm 100 × 100 mm', 'info'],
      ['stock.white-ash.75x75', 'white-ash 75 × 75 mm', 'info'],
      ['stock.white-oak.75x75', 'white-oak 75 × 75 mm', 'info'],
    ]);
    // Steam-bent blanks (the pole and the felloe pieces) are cut from the white ash.
    expect(found[1].message).toContain('Steam-bent blanks (pole, felloe piece)');
    expect(found[0].message).not.toContain('Steam-bent');
  });

  it('costs the stock at price per m³ × section × length', async () => {
    // The yoke alone in white oak 75 × 75 at 1600 per m³: one 1800 mm length = 1600 × 0.075² × 1.8 = 16.2.
    const found = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), THREE_STOCKS));
    const oak = found.find((f) => f.subject === 'stock.white-oak.75x75')!;
    expect(oak.params.cost as number).toBeCloseTo(1600 * 0.075 ** 2 * 1.8, 9);
    expect(oak.message).toContain('stock lengths to buy 1 costing 16.2; parts cut 1');
    expect(oak.fix).toContain('Buy 1 × 1800 mm');
    expect(oak.value).toBe(1);
  });

  it('counts pieces where no price is listed, and says how far the plan is from its bound', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { stock: { lumber: [{ species: 'white-ash', width_mm: 75, thickness_mm: 75, lengths_mm: [2400, 3600] }] } });
    const ash = (await findingsOf(RULE, raw))[0];
    expect(ash.params).not.toHaveProperty('cost');
    expect(ash.message).not.toContain('costing');
    expect(ash.message).toMatch(/proven the least stock|above the lower bound of [\d.]+ stock lengths/);
  });

  it('boundary: no listed stock, no plan to note', async () => {
    expect(await findingsOf(RULE, readDemo('demo-rear-axle'))).toEqual([]);
  });
});
