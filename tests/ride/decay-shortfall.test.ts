import { describe, expect, it } from 'vitest';
import { decayCycles, type TurningPoint } from '../../src/core/ride/decay.ts';
import { decayShortfall } from '../../src/core/ride/decay-shortfall.ts';
import { secantLeast } from '../../src/core/ride/secant-least.ts';

// The decay's shortfall (the tuner's continuous stand-in for the decay rule)
// on turning points of known motions, and the secant search on closed forms.

const FRACTION = 0.1, CYCLES = 3;

/** Turning points of a decaying oscillation: logarithmic decrement delta per cycle, half period 1 s, the first half cycle `late` s longer. */
function turning(delta: number, late = 0): TurningPoint[] {
  return Array.from({ length: 12 }, (_, k) => ({ t: k + (k > 0 ? late : 0), z: (-1) ** k * Math.exp((-k * delta) / 2) }));
}

describe('the decay shortfall', () => {
  it('is 1 − δ/δ_needed for a linear single-degree motion', () => {
    // Thomson and Dahleh, Theory of Vibration with Applications, section 2.6: successive amplitudes
    // fall by e^(−δ/2) a half cycle, δ = 2πζ/√(1 − ζ²); three cycles to 10 % need δ = ln(10)/3.
    const needed = Math.log(1 / FRACTION) / CYCLES;
    for (const zeta of [0.08, 0.1213, 0.15, 0.2]) {
      const delta = (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
      expect(decayShortfall(turning(delta), FRACTION, CYCLES)).toBeCloseTo(1 - delta / needed, 12);
    }
  });

  it('holds exactly where the rule\'s own measure does, and moves smoothly where that measure jumps', () => {
    // A first half cycle 0.3 s long of 1 s: the rule's period, measured to the first turning point
    // below the fraction, changes where that point changes, and its cycles jump there.
    let worstRuleStep = 0, worstStep = 0;
    let before: { cycles: number; shortfall: number } | null = null;
    for (let delta = 0.6; delta <= 0.95; delta += 0.001) {
      const pts = turning(delta, 0.3);
      const cycles = decayCycles(pts, FRACTION).cycles!;
      const shortfall = decayShortfall(pts, FRACTION, CYCLES);
      expect(shortfall <= 0, `δ = ${delta}`).toBe(cycles <= CYCLES);
      if (before) {
        worstRuleStep = Math.max(worstRuleStep, Math.abs(cycles - before.cycles));
        worstStep = Math.max(worstStep, Math.abs(shortfall - before.shortfall));
      }
      before = { cycles, shortfall };
    }
    // Steps of δ of 0.001 move a smooth measure by about 0.001/0.77 relative: the rule's jumps by 0.03 cycles (1 %), the shortfall never.
    expect(worstRuleStep).toBeGreaterThan(0.02);
    expect(worstStep).toBeLessThan(0.003);
  });

  it('has nothing to say without a turning point after the largest', () => {
    expect(decayShortfall([{ t: 0, z: -1 }], FRACTION, CYCLES)).toBeNaN();
  });
});

describe('the secant search for the least value that holds', () => {
  it('settles on the root of a smooth excess in a few trials', () => {
    // g = (0.3/z)^1.5 − 1: holds from z = 0.3, by hand; started 20 % low, the first step a plain proportion.
    const s = secantLeast((z) => (0.3 / z) ** 1.5 - 1, 0.24, (p) => p.z * (1 + p.g), { lower: 0.02, upper: 1, tolerance: 5e-3, maxTrials: 8 });
    // Either the secant's root (to a quarter of the tolerance) or a holding trial within the tolerance above it.
    expect(['secant', 'bracket']).toContain(s.how);
    expect(s.root! / 0.3 - 1).toBeGreaterThan(-5e-3 / 4);
    expect(s.root! / 0.3 - 1).toBeLessThanOrEqual(5e-3);
    expect(s.tried.length).toBeLessThanOrEqual(5);
  });

  it('walks up the given values, so a condition that holds only on a band is found from below', () => {
    // g = |z − 0.5| − 0.1 holds on [0.4, 0.6] only; a long first step would land beyond it.
    const g = (z: number) => Math.abs(z - 0.5) - 0.1;
    const o = { lower: 0.1, upper: 1, tolerance: 5e-3, maxTrials: 12 };
    expect(secantLeast(g, 0.1, (p) => 8 * p.z, o).root).toBeNull();
    const walked = secantLeast(g, 0.1, (p) => 8 * p.z, { ...o, walk: [0.1, 0.2, 0.3, 0.5, 0.7, 1] });
    expect(walked.root).not.toBeNull();
    expect(Math.abs(walked.root! / 0.4 - 1)).toBeLessThanOrEqual(5e-3);
  });
});
