import { describe, expect, it } from 'vitest';
import { G } from '../../src/core/units/units.ts';
import { deepMerge, findingsOf, fractionHitting, readDemo } from '../support/fixtures.ts';

const RULE = 'turn.rollover';

describe(RULE, () => {
  it('passes at 20 km/h on a 15 m turn', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    // a_lat = v^2 R_a / R_y^2 (mechanics note, section 4), v = 20/3.6 m/s
    const v = 20 / 3.6;
    expect(f.value).toBeCloseTo((v * v * Math.sqrt(225 - 2.67 ** 2)) / 225, 9);
  });

  it('fails for the teaching example (25 km/h on 6 m) and gives a safe speed and radius', async () => {
    const [f] = await findingsOf(RULE, readDemo('teaching-flawed'));
    expect(f.severity).toBe('fail');
    expect(f.fix).toMatch(/Slow to \d+(\.\d+)? km\/h/);
    expect(f.working_text).toContain('v_roll = R_y·√(g·SSF / R_a)');
  });

  it('warns between the advisory and the hard fraction', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { operation: { speed_kmh: 30 } }));
    // 30 km/h on 15 m: a_lat = 8.333^2 x 14.76 / 225 = 4.56 m/s^2, about 76 % of g*SSF here
    expect(['warning', 'fail']).toContain(f.severity);
    expect(f.value).toBeCloseTo(((30 / 3.6) ** 2 * Math.sqrt(225 - 2.67 ** 2)) / 225, 9);
  });

  it('boundary: a lateral acceleration equal to the hard limit is within it', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const aRoll = probe.working.find((s) => s.formula === 'a_roll = g·SSF')!.result!;
    // The finding reports the hard level, 0.75 of g·SSF (rules/limits/turn.yaml), and prints both.
    expect(probe.limit!).toBeCloseTo(0.75 * aRoll, 12);
    expect(probe.params.advisory as number).toBeCloseTo(0.5 * aRoll, 12);
    expect(aRoll / G).toBeGreaterThan(0.3);
    const frac = fractionHitting(probe.value!, aRoll);
    const [f] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac, 'lateral_fraction.hard': frac });
    expect(f.severity).toBe('pass');
    const [g] = await findingsOf(RULE, raw, { 'lateral_fraction.advisory': frac * 0.99, 'lateral_fraction.hard': frac * 0.99 });
    expect(g.severity).toBe('fail');
  });
});
