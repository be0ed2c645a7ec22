import { describe, expect, it } from 'vitest';
import { bumpHeight, coarseHeights, envelopeAt, wheelEnvelope } from '../../src/core/ride/road-envelope.ts';

// The path of a rigid wheel's centre over a raised-cosine bump (the envelope
// max over s of z(s) + sqrt(r² − (x − s)²) − r). Closed forms: with the
// centre over the crest the wheel touches the crest, so the lift is the
// bump's height; the wheel never sinks into the bump (lift ≥ z(x)); its slope
// is the envelope theorem's (s* − x)/sqrt(r² − (x − s*)²), checked against
// central differences. The bumps (a 20 mm ridge 500 mm long, a 30 mm stone
// 200 mm long) and the 450 mm radius are test inputs of our own.

const R = 0.45;
const BUMPS = [{ height: 0.02, length: 0.5 }, { height: 0.03, length: 0.2 }];

describe('the wheel envelope over a bump', () => {
  for (const b of BUMPS) {
    it(`${b.height * 1000} mm × ${b.length * 1000} mm: lifts by the bump's height over its crest, never sinks into it, slope by the envelope theorem`, () => {
      expect(Math.abs(envelopeAt(b, R, b.length / 2).z - b.height)).toBeLessThan(1e-12);
      const env = wheelEnvelope(b, R);
      const out = new Float64Array(2);
      for (let x = env.start + 0.002; x < env.end - 0.002; x += 0.0037) {
        const e = envelopeAt(b, R, x);
        expect(e.z).toBeGreaterThanOrEqual(bumpHeight(b, x) - 1e-12);
        const dz = (envelopeAt(b, R, x + 1e-6).z - envelopeAt(b, R, x - 1e-6).z) / 2e-6;
        expect(Math.abs(e.slope - dz)).toBeLessThan(1e-4 * Math.max(1, Math.abs(dz)));
        // The table read between its points stays within a micrometre of the direct search.
        env.at(x, out);
        expect(Math.abs(out[0] - e.z)).toBeLessThan(1e-6);
      }
      env.at(env.start - 0.01, out);
      expect([...out]).toEqual([0, 0]);
    });

    it(`${b.height * 1000} mm × ${b.length * 1000} mm: the coarse heights kept between points change nothing, bit for bit`, () => {
      const memo = coarseHeights();
      for (let x = -0.2; x < b.length + 0.2; x += 0.001) expect(envelopeAt(b, R, x, memo)).toEqual(envelopeAt(b, R, x));
    });
  }
});
