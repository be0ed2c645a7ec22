// A ride case's time series as CSV: one column per channel, the unit in each
// header ("driver floor force (N)"), time first.

import type { RideSeries } from '../core/ride/ride-types.ts';

export function rideCsv(series: RideSeries): string {
  const header = ['time (s)', ...series.channels.map((c) => `${c.name} (${c.unit})`)].map(csvField);
  const rows = series.t_s.map((t, i) => [number(t), ...series.channels.map((c) => number(c.values[i]))].join(','));
  return [header.join(','), ...rows].join('\n') + '\n';
}

/** Quoted where a comma, quote or line break would break the row. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Nine significant digits: more than any input carries, and short. */
function number(v: number | undefined): string {
  return v === undefined || !Number.isFinite(v) ? '' : String(Number(v.toPrecision(9)));
}
