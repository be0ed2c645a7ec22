import { describe, expect, it } from 'vitest';
import { G } from '../../src/core/units/units.ts';
import { findingsOf, fractionHitting, readDemo, deepMerge } from '../support/fixtures.ts';

const RULE = 'balance.horse-load';

describe(RULE, () => {
  it('passes for the central-axle demo', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass']);
    expect(found[0].subject).toBe('case.static');
    expect(found[0].subject_label).toBe('standing, crew as placed');
    expect(found[0].load_case).toBe('static');
  });

  it('warns above the advisory fraction and fails above the hard one', async () => {
    const raw = deepMerge(readDemo('demo-rear-axle'), { team: { horse_mass_kg: 200 } });
    const found = await findingsOf(RULE, raw);
    const worst = found[found.length - 1];
    // 172 N on a 200 kg horse is 8.8 % of its weight: above 5 %, below 10 %.
    expect(worst.severity).toBe('warning');
    const [, hard] = await findingsOf(RULE, deepMerge(raw, { team: { horses: 1 } }));
    expect(hard.severity).toBe('fail');
    expect(hard.limit!).toBeCloseTo(0.1 * 200 * G, 9);
    expect(hard.utilisation!).toBeCloseTo(hard.value! / hard.limit!, 12);
    // The numbers the message prints are the limit's own: 5 % and 10 % of 200 kg × g.
    expect(hard.params.advisory as number).toBeCloseTo(0.05 * 200 * G, 9);
    expect(hard.params.hard as number).toBeCloseTo(0.1 * 200 * G, 9);
    expect(hard.sources).toEqual(expect.arrayContaining(['design-basis-balance', 'from-memory']));
  });

  it('boundary: a load equal to the hard limit is not above it', async () => {
    const raw = readDemo('demo-rear-axle');
    const worst = (await findingsOf(RULE, raw)).at(-1)!;
    const W = 340 * G;
    const f = fractionHitting(worst.value!, W);
    const at = (await findingsOf(RULE, raw, { 'load_fraction.advisory': f, 'load_fraction.hard': f })).at(-1)!;
    expect(at.limit).toBe(worst.value);
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, raw, { 'load_fraction.advisory': f * 0.999, 'load_fraction.hard': f * 0.999 })).at(-1)!;
    expect(over.severity).toBe('fail');
  });
});
