import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { rideCaseOf, runSettings } from '../../src/core/ride/ride-model.ts';
import { buildRide } from '../../src/core/ride/ride-build.ts';
import { runRide } from '../../src/core/ride/ride-run.ts';
import type { RideResult } from '../../src/core/ride/ride-types.ts';
import { PLOT_SAMPLES, rideCaseSummary } from '../../src/core/result/ride-summary.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// A ride case whose time series nobody draws (a decisive trial, a sweep
// point) keeps none, and must judge the build exactly as one that keeps it:
// the peaks are read at the steps' own points, never at the plots' samples.
// Compared with the run that keeps the series, and with series sampled four
// times as finely, bit for bit.

/** A case's measures: everything but its series. */
const measures = (r: RideResult): Omit<RideResult, 'series'> => {
  const { series: _series, ...rest } = r;
  return rest;
};

describe('a ride case without its time series', () => {
  it('gives every measure the full run gives, to the last bit, and an empty series', () => {
    for (const name of ['demo-two-crew', 'demo-rear-axle']) {
      const input = rideInput(new Analysis(prepared(readDemo(name)), rulesData));
      for (const which of ['rough-ridge', 'stone-one-wheel', 'drop'] as const) {
        const full = rideCaseOf(input, which);
        const bare = rideCaseOf(input, which, { series: false });
        expect(full.series.t_s.length, `${name} ${which}`).toBeGreaterThan(100);
        expect(bare.series).toEqual({ t_s: [], channels: [] });
        expect(measures(bare), `${name} ${which}`).toStrictEqual(measures(full));
      }
    }
  });

  it('gives the same measures at any sample interval of the plots', () => {
    const input = rideInput(new Analysis(prepared(readDemo('demo-two-crew')), rulesData));
    for (const which of ['rough-one-wheel', 'stone-ridge'] as const) {
      const settings = runSettings(input, which);
      const coarse = runRide(buildRide(input, which), which, settings);
      const fine = runRide(buildRide(input, which), which, { ...settings, sampleInterval: settings.sampleInterval / 4 });
      expect(fine.series.t_s.length).toBeGreaterThan(3 * coarse.series.t_s.length);
      expect(measures(fine), which).toStrictEqual(measures(coarse));
    }
  });

  it("takes only a plot's samples where only a plot is drawn: the same summary as the full series thinned, bit for bit", () => {
    for (const name of ['demo-two-crew', 'teaching-flawed']) {
      const input = rideInput(new Analysis(prepared(readDemo(name)), rulesData));
      for (const which of ['rough-ridge', 'stone-one-wheel', 'drop'] as const) {
        const full = rideCaseOf(input, which);
        const plot = rideCaseOf(input, which, { plotPoints: PLOT_SAMPLES });
        expect(plot.series.stride, `${name} ${which}`).toBeGreaterThan(1);
        expect(plot.series.t_s.length).toBeLessThan(full.series.t_s.length / 2);
        expect(rideCaseSummary(plot), `${name} ${which}`).toStrictEqual(rideCaseSummary(full));
      }
    }
  });
});
