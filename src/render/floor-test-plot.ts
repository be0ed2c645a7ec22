// The drop record with the fitted damped sine over its free-vibration part.

import { dampedSineAt } from '../core/floor-test/damped-sine-fit.ts';
import type { DropRecord, FloorTestEstimate } from '../core/floor-test/floor-test-types.ts';
import { plotSvg } from './plots/plot-svg.ts';
import type { PlotData } from '../core/plots/plot-data.ts';
import { formatNumber, formatQuantity } from '../core/format/number-format.ts';

export function floorTestPlotSvg(record: DropRecord, e: FloorTestEstimate): string {
  return plotSvg(floorTestPlot(record, e));
}

/** The plot as data: the whole record, so nothing of it is cut off. */
export function floorTestPlot(record: DropRecord, e: FloorTestEstimate): PlotData {
  const { start_s, end_s } = e.free_vibration;
  const t = record.t_s.filter((v) => v >= start_s && v <= end_s);
  const fitted = dampedSineAt(e.fit, t.map((v) => v - start_s));
  return {
    id: 'floor-test',
    title: `Drop test: record and fitted damped sine (f_n ${formatQuantity(e.natural_frequency_hz, 'Hz')}, damping ratio ${formatNumber(e.damping_ratio)})`,
    caption: 'The drop record, the damped sine fitted to its free vibration, and the turning points the logarithmic decrement used.',
    xLabel: 'time (s)',
    yLabel: 'displacement (mm)',
    lines: [
      { label: 'record', x: record.t_s, y: record.x_mm },
      { label: 'fit (free vibration)', x: t, y: fitted, style: 'dashed' },
      { label: 'turning points used', x: e.extrema.map((p) => p.t_s), y: e.extrema.map((p) => p.x_mm), style: 'dots' },
    ],
    rules: [],
  };
}
