import { describe, expect, it } from 'vitest';
import { ridePlot, RIDE_PLOTS } from '../../src/render/ride-plots.ts';
import { yDomain } from '../../src/render/plots/plot-domains.ts';
import { RIDE_CASES } from '../../src/core/ride/ride-types.ts';
import { demoRide } from '../fixtures/sample-ride.ts';

// The ride plots of the two-crew demo show each case's event and its decay,
// not the whole run, and hold every value they draw on their y axis.

describe.each(RIDE_CASES.map((c) => [c]))('ride plots of %s', (c) => {
  const r = demoRide().results[c];
  const plots = RIDE_PLOTS.map((p) => ridePlot(c, r.title, r.series, p.kind)).filter((p) => p !== null);
  const run = r.series.t_s;

  it('share one time window, shorter than the run, that holds every channel\'s largest excursion', () => {
    const spans = plots.map((p) => [p.lines[0].x[0], p.lines[0].x.at(-1)!]);
    for (const s of spans) expect(s).toEqual(spans[0]);
    const [from, to] = spans[0];
    expect(to - from).toBeLessThan(0.6 * (run.at(-1)! - run[0]));
    for (const ch of r.series.channels) {
      const rest = ch.values.at(-1)!;
      const k = ch.values.reduce((best, v, i) => (Math.abs(v - rest) > Math.abs(ch.values[best] - rest) ? i : best), 0);
      expect(run[k], ch.name).toBeGreaterThanOrEqual(from);
      expect(run[k], ch.name).toBeLessThanOrEqual(to);
    }
    expect(plots[0].xLabel).toMatch(/^time \(s\), showing .* of a 3 s run$/);
  });

  it('keeps every drawn value inside the y axis', () => {
    for (const p of plots) {
      const [lo, hi] = yDomain(p);
      for (const l of p.lines) for (const v of l.y) expect(v >= lo && v <= hi, `${p.id} ${l.label} ${v}`).toBe(true);
    }
  });
});

describe('the drop test plot', () => {
  it('starts at the release, so the whole fall from the drop height is shown', () => {
    const r = demoRide().results.drop;
    const heights = ridePlot('drop', r.title, r.series, 'heights')!;
    expect(heights.lines[0].x[0]).toBe(0);
    const top = Math.max(...heights.lines.flatMap((l) => l.y));
    expect(top).toBe(Math.max(...r.series.channels.filter((c) => c.unit === 'mm').flatMap((c) => c.values)));
    expect(yDomain(heights)[1]).toBeGreaterThan(top);
  });
});
