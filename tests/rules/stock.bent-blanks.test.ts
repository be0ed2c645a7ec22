import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const RULE = 'stock.bent-blanks';
const withGood = (fraction: number) => withParams('cutlist', { bend_good_fraction: fraction });

describe(RULE, () => {
  it('notes each steam-bent part of the central-axle demo, spares at the good-bend fraction', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found.map((f) => f.subject_label)).toEqual(['floor frame front rail, bent, with the sides', 'pole', 'felloe piece']);
    expect(found.map((f) => f.subject)).toEqual(['part.floor-frame-front-rail-bent-with-the-sides', 'part.pole', 'part.felloe-piece']);
    expect(found.every((f) => f.severity === 'info')).toBe(true);
    // 4 felloe pieces at 0.75 good (Lemoine & Koch 1971, reference figures): ceil(4/0.75) = 6 blanks.
    const felloe = found[2];
    expect(felloe.value).toBe(Math.ceil(4 / rulesData.params.cutlist.bend_good_fraction.value));
    expect(felloe.value).toBe(6);
    expect(felloe.message).toContain('cut 6 blanks (4 + 2 spare at 75\u00a0% good bends)');
    expect(felloe.sources).toContain('lemoine-koch-1971');
    expect(felloe.working_text).toContain('Lemoine and Koch');
  });

  it('nothing bent, nothing to say: the rear-axle demo with sawn felloes and a straight frame', async () => {
    expect(await findingsOf(RULE, deepMerge(readDemo('demo-rear-axle'), { wheels: { felloe: { bend_radius_mm: undefined } }, pole: { bend_radius_mm: undefined } }))).toEqual([]);
  });

  it('boundary: at a good fraction of exactly 0.8, 4 pieces take 5 blanks; a hair lower, 6', async () => {
    const felloe = async (g: number) => (await findingsOf(RULE, readDemo('demo-two-crew'), {}, withGood(g))).find((f) => f.subject === 'part.felloe-piece')!.value;
    expect(await felloe(0.8)).toBe(5);
    expect(await felloe(0.8 - 1e-6)).toBe(6);
  });
});
