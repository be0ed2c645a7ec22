import { describe, expect, it } from 'vitest';
import { deepMerge, readDemo, rulesData, prepared } from '../support/fixtures.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import type { RulesData } from '../../src/core/data/rules-data.ts';

const RULE = 'stock.bent-blanks';
const rule = RULES.find((r) => r.id === RULE)!;

function withGood(fraction: number): RulesData {
  const cutlist = { ...rulesData.params.cutlist, bend_good_fraction: { ...rulesData.params.cutlist.bend_good_fraction, value: fraction } };
  return { ...rulesData, params: { ...rulesData.params, cutlist } };
}
const run = (raw: unknown, data = rulesData) => runRules([rule], prepared(raw, data), data);

describe(RULE, () => {
  it('advises on each steam-bent part of the central-axle demo, spares at the good-bend fraction', () => {
    const found = run(readDemo('demo-two-crew'));
    expect(found.map((f) => f.subject)).toEqual(['floor frame front rail, bent, with the sides', 'pole', 'felloe piece']);
    expect(found.every((f) => f.severity === 'info')).toBe(true);
    // 4 felloe pieces at 0.75 good (Lemoine & Koch 1971, reference figures): ceil(4/0.75) = 6 blanks.
    const felloe = found[2];
    expect(felloe.value).toBe(Math.ceil(4 / rulesData.params.cutlist.bend_good_fraction.value));
    expect(felloe.message).toContain('4 + 2 spare at 75 % good bends');
    expect(felloe.working_text).toContain('Lemoine and Koch');
  });

  it('nothing bent, nothing to say: the rear-axle demo with sawn felloes and a straight frame', () => {
    expect(run(deepMerge(readDemo('demo-rear-axle'), { wheels: { felloe: { bend_radius_mm: undefined } }, pole: { bend_radius_mm: undefined } }))).toEqual([]);
  });

  it('boundary: at a good fraction of exactly 0.8, 4 pieces take 5 blanks; a hair lower, 6', () => {
    const felloe = (g: number) => run(readDemo('demo-two-crew'), withGood(g)).find((f) => f.subject === 'felloe piece')!.value;
    expect(felloe(0.8)).toBe(5);
    expect(felloe(0.8 - 1e-6)).toBe(6);
  });
});
