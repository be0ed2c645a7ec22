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
    // The value is the turns given against a least of 1.0 × the turns needed (a minimum: utilisation is limit over value).
    expect(f.value).toBe(2);
    expect(f.limit).toBeCloseTo(NEEDED, 12);
    expect(f.params.need as number).toBeCloseTo(NEEDED, 12);
    expect(f.utilisation!).toBeCloseTo(NEEDED / 2, 12);
    expect(f.subject).toBe('joint.pole-to-axle');
    expect(f.severity).toBe('pass');
  });

  it('fails with one turn', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle(1)));
    expect(f.severity).toBe('fail');
    // one turn holds 10 × e^(2π × 0.61) = 10 × e^3.8327 = 10 × 46.189 = 461.9 N
    expect(f.working.find((s) => s.formula.startsWith('the turns given hold'))!.result!).toBeCloseTo(461.89, 2);
    expect(f.message).toContain('breaking pull of 960\u00a0N; only 1 are given');
  });

  it('gives advice with the turns needed where none are given', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle()));
    expect(f.severity).toBe('advice');
    expect(f.value).toBeNull();
    expect(f.message).toContain('1.19 full turns');
    expect(f.fix).toContain('at least 2 full turns');
  });

  it('boundary: as many turns as needed is enough', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, poleToAxle()));
    const need = f.params.need as number;
    const [at] = await findingsOf(RULE, deepMerge(demo, poleToAxle(need)));
    expect(at.value).toBe(at.limit);
    expect(at.severity).toBe('pass');
    const [under] = await findingsOf(RULE, deepMerge(demo, poleToAxle(need * 0.999999)));
    expect(under.severity).toBe('fail');
  });

  it('boundary: the hard level of the turns limit scales the turns needed', async () => {
    // Two turns given against 1.0 × 1.1909 needed pass; a level of 2 / 1.1909 asks for exactly two; a hair more fails.
    const raw = deepMerge(demo, poleToAxle(2));
    const [at] = await findingsOf(RULE, raw, { 'turns.hard': 2 / NEEDED });
    expect(at.limit!).toBeCloseTo(2, 12);
    const [over] = await findingsOf(RULE, raw, { 'turns.hard': (2 / NEEDED) * 1.000001 });
    expect(over.severity).toBe('fail');
  });
});
