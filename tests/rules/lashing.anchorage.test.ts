import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, readDemo } from '../support/fixtures.ts';

const RULE = 'lashing.anchorage';
const demo = readDemo('demo-two-crew');
const poleToAxle = (anchor_turns?: number) => ({ lashings: [{ joint: 'pole-to-axle', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 12, ...(anchor_turns === undefined ? {} : { anchor_turns }) }] });

// Hand calculation: the rawhide strap 16 × 3 mm at 20 MPa breaks at 960 N; with a
// tail pull of 10 N and mu = 0.61, turns = ln(96) / (2π × 0.61) = 4.5643 / 3.8327 = 1.1909.
const NEEDED = Math.log(960 / 10) / (2 * Math.PI * 0.61);

describe(RULE, () => {
  it('passes with two turns at each end', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle(2)));
    expect(NEEDED).toBeCloseTo(1.1909, 4);
    expect(f.value).toBeCloseTo(NEEDED, 12);
    expect(f.limit).toBe(2);
    expect(f.severity).toBe('pass');
  });

  it('fails with one turn', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle(1)));
    expect(f.severity).toBe('fail');
    // one turn holds 10 × e^(2π × 0.61) = 10 × 46.186 = 461.9 N
    expect(f.working_text).toContain('= 461.9 N');
  });

  it('gives advice with the turns needed where none are given', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle()));
    expect(f.severity).toBe('advice');
    expect(f.message).toContain('1.19 full turns');
  });

  it('boundary: as many turns as needed is enough', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle()));
    const [at] = await findingsOf(RULE, deepMerge(demo, poleToAxle(f.value!)));
    expect(at.value).toBe(at.limit);
    expect(at.severity).toBe('pass');
    const [under] = await findingsOf(RULE, deepMerge(demo, poleToAxle(f.value! * 0.999999)));
    expect(under.severity).toBe('fail');
  });
});
