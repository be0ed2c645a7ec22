import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// A ride case whose time series nobody draws (a decisive trial, a sweep
// point) keeps none, and must judge the build exactly as one that keeps it:
// the peaks read the same sample points either way. Compared with the run
// that keeps the series, bit for bit.

describe('a ride case without its time series', () => {
  it('gives every measure the full run gives, to the last bit, and an empty series', () => {
    for (const name of ['demo-two-crew', 'demo-rear-axle']) {
      const input = rideInput(new Analysis(prepared(readDemo(name)), rulesData));
      for (const which of ['rough-ridge', 'stone-one-wheel', 'drop'] as const) {
        const full = rideCaseOf(input, which);
        const bare = rideCaseOf(input, which, { series: false });
        expect(full.series.t_s.length, `${name} ${which}`).toBeGreaterThan(100);
        expect(bare.series).toEqual({ t_s: [], channels: [] });
        const { series: _full, ...fullMeasures } = full;
        const { series: _bare, ...bareMeasures } = bare;
        expect(bareMeasures, `${name} ${which}`).toStrictEqual(fullMeasures);
      }
    }
  });
});
