import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, fractionHitting, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.rollover';
// Equilibrium (EQU), EN 1990 Table A1.2(A): the lateral inertia, a variable
// action that destabilises, × 1.5; the threshold the weight gives, a
// permanent action that stabilises, × 0.9 (rules/parameters/combinations.yaml).
const GQ = 1.5;
const GSTB = 0.9;

describe(RULE, () => {
  it('passes at 20 km/h on a 15 m turn, comparing 1.5 a_lat with 0.9 g·SSF', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.combination).toBe('equilibrium');
    // a_lat = v^2 R_a / R_y^2 (design basis, section 4), v = 20/3.6 m/s
    const v = 20 / 3.6;
    const aLat = (v * v * Math.sqrt(225 - 2.715 ** 2)) / 225;
    expect(f.params.lateral as number).toBeCloseTo(aLat, 9);
    expect(f.value).toBeCloseTo(GQ * aLat, 9);
    const aRoll = f.working.find((s) => s.formula === 'a_roll = g·SSF')!.result!;
    expect(f.limit).toBeCloseTo(1.0 * GSTB * aRoll, 9); // hard level 1.0 of the EQU resistance
    expect(f.params.advisory as number).toBeCloseTo(0.8 * GSTB * aRoll, 9); // advisory level 0.8 (from memory)
  });

  it('fails for the teaching example (25 km/h on 6 m) and gives a safe speed and radius', async () => {
    const [f] = await findingsOf(RULE, readDemo('teaching-flawed'));
    expect(f.severity).toBe('fail');
    expect(f.fix).toMatch(/Slow to \d+(\.\d+)? km\/h/);
    expect(f.working_text).toContain('v_roll = R_y·√(g·SSF / R_a)');
  });

  it('warns between the advisory and the hard level', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { speed_kmh: 24 } }));
    const aRoll = f.working.find((s) => s.formula === 'a_roll = g·SSF')!.result!;
    const u = f.value! / (GSTB * aRoll);
    expect(f.severity).toBe(u > 1 ? 'fail' : u > 0.8 ? 'warning' : 'pass');
    expect(f.value).toBeCloseTo(GQ * (((24 / 3.6) ** 2 * Math.sqrt(225 - 2.715 ** 2)) / 225), 9);
  });

  it('boundary: a design lateral acceleration equal to the hard limit is within it', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const aRoll = probe.working.find((s) => s.formula === 'a_roll = g·SSF')!.result!;
    const frac = fractionHitting(probe.value!, GSTB * aRoll);
    const [f] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac, 'lateral_fraction.hard': frac });
    expect(f.severity).toBe('pass');
    const [g] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac * 0.99, 'lateral_fraction.hard': frac * 0.99 });
    expect(g.severity).toBe('fail');
  });
});
