import { describe, expect, it } from 'vitest';
import { G } from '../../src/core/units/units.ts';
import { deepMerge, findingsOf, fractionHitting, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'turn.sliding';
// Equilibrium (EQU), EN 1990 Table A1.2(A): 1.5 × a_lat against 0.9 × mu·g.
const GQ = 1.5;
const GSTB = 0.9;

describe(RULE, () => {
  it('passes at 20 km/h on a 15 m turn on turf', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.combination).toBe('equilibrium');
    const muG = rulesData.grounds.turf.lateral_friction.value * G;
    expect(f.value).toBeCloseTo(GQ * (f.params.lateral as number), 12);
    expect(f.limit).toBeCloseTo(1.0 * GSTB * muG, 9);
    expect(f.params.advisory as number).toBeCloseTo(0.8 * GSTB * muG, 9);
  });

  it('fails when the turn needs more than the ground gives', async () => {
    const [f] = await findingsOf(RULE, readDemo('teaching-flawed'));
    expect(f.severity).toBe('fail');
    expect(f.message).toContain('slides before it tips');
  });

  it('boundary: equal to the hard limit is within it', async () => {
    const raw = deepMerge(readDemo('demo-two-crew'), { operation: { ground: 'packed-earth' } });
    const [probe] = await findingsOf(RULE, raw);
    const slide = GSTB * rulesData.grounds['packed-earth'].lateral_friction.value * G;
    const frac = fractionHitting(probe.value!, slide);
    const [f] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac, 'lateral_fraction.hard': frac });
    expect(f.severity).toBe('pass');
    const [g] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac * 0.99, 'lateral_fraction.hard': frac * 0.99 });
    expect(g.severity).toBe('fail');
  });
});
