import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, fractionHitting, readDemo } from '../support/fixtures.ts';

const RULE = 'lashing.slip';
const demo = readDemo('demo-two-crew');
const axleToFloor = (wraps: number, pretension_N: number) => ({ lashings: [{ joint: 'axle-to-floor', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps, pretension_N }] });

describe(RULE, () => {
  it('passes with enough wraps, tight enough', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, axleToFloor(20, 150)));
    // 0.36 × 2 × 20 × 150 = 2160 N of clamp friction (hand calculation): the hard limit, 1.0 of it; the advisory limit 0.8 of it, 1728 N
    expect(f.limit).toBeCloseTo(2160, 9);
    expect(f.params.capacity as number).toBeCloseTo(2160, 9);
    expect(f.params.advisory as number).toBeCloseTo(1728, 9);
    expect(f.message).toContain('2160\u00a0N of friction');
    expect(f.severity).toBe('pass');
    expect(f.message).toContain("builder's estimated pretension of 150\u00a0N");
    expect(f.sources).toContain('villar-garcia-2020');
  });

  it('fails where the box and crew can slide on the bearings in a hard stop', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, axleToFloor(8, 100)));
    // 0.36 × 2 × 8 × 100 = 576 N against the box and crew thrown forward by the stopping shock
    // (an accidental case, factor 1.0: EN 1990 6.4.3.3), about 1000 N
    expect(f.limit).toBeCloseTo(576, 9);
    expect(f.severity).toBe('fail');
    expect(f.load_case).toBe('stopping-shock');
    expect(f.combination).toBe('accidental');
    expect(f.working_text).toContain('stopping shock');
  });

  it('warns between the advisory level and the whole slip capacity', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, axleToFloor(8, 100)));
    const mu = f.value! / (0.9 * 2 * 8 * 100); // the force is then 0.9 of the capacity
    const [w] = await findingsOf(RULE, deepMerge(demo, axleToFloor(8, 100)), { friction_wood_on_wood: mu });
    expect(w.severity).toBe('warning');
    expect(w.utilisation!).toBeCloseTo(0.9, 9);
  });

  it('boundary: a force equal to the slip capacity, or to the advisory limit, is within it', async () => {
    const raw = deepMerge(demo, axleToFloor(8, 100));
    const [f] = await findingsOf(RULE, raw);
    const mu = fractionHitting(f.value!, 2 * 8 * 100);
    const [at] = await findingsOf(RULE, raw, { friction_wood_on_wood: mu, 'utilisation.advisory': 1 });
    expect(at.limit).toBe(at.value);
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { friction_wood_on_wood: mu * 0.999999, 'utilisation.advisory': 1 });
    expect(over.severity).toBe('fail');

    const big = 2; // a clamp twice the force: then the advisory level decides
    const [ok] = await findingsOf(RULE, raw, { friction_wood_on_wood: big });
    const adv = fractionHitting(ok.value!, big * 2 * 8 * 100);
    const [atAdv] = await findingsOf(RULE, raw, { friction_wood_on_wood: big, 'utilisation.advisory': adv });
    expect(atAdv.params.advisory).toBe(atAdv.value);
    expect(atAdv.severity).toBe('pass');
    const [overAdv] = await findingsOf(RULE, raw, { friction_wood_on_wood: big, 'utilisation.advisory': adv * 0.999999 });
    expect(overAdv.severity).toBe('warning');
  });
});
