// Plots of one ride case over time: the length channels (crew and wheel
// heights), the floor forces under the crew, and the other forces (wheels on
// the ground, the yoke). Floor forces are the force channels the ride model
// names "... floor force". The three plots of a case share one time window:
// the event and its decay (plots/event-window.ts), said on the time axis.
// The file names are shared by the ride command, the check's outputs and the
// report, which links them from Markdown and puts them inline in HTML.

import type { RideCase, RideChannel, RideSeries } from '../core/ride/ride-types.ts';
import type { PlotData } from '../core/plots/plot-data.ts';
import { plotSvg } from './plots/plot-svg.ts';
import { eventWindow, sampleRange } from './plots/event-window.ts';
import { formatNumber } from '../core/format/number-format.ts';

const isFloorForce = (c: RideChannel) => c.unit === 'N' && /floor force$/.test(c.name);

export const RIDE_PLOTS = [
  { kind: 'heights', title: 'crew and wheel heights', yLabel: 'height from standing (mm)', pick: (c: RideChannel) => c.unit === 'mm' },
  { kind: 'floor-forces', title: 'floor forces under the crew', yLabel: 'force (N)', pick: isFloorForce },
  { kind: 'support-forces', title: 'wheel and yoke forces', yLabel: 'force (N)', pick: (c: RideChannel) => c.unit === 'N' && !isFloorForce(c) },
] as const;

export type RidePlotKind = (typeof RIDE_PLOTS)[number]['kind'];

export function ridePlotFile(c: RideCase, kind: RidePlotKind): string {
  return `ride-${c}-${kind}.svg`;
}

/** A ride plot's title and caption, from the case's title; the report shows them beside the plot. */
export function ridePlotText(caseTitle: string, kind: RidePlotKind): { title: string; caption: string } {
  const spec = RIDE_PLOTS.find((p) => p.kind === kind)!;
  const heading = `${caseTitle.charAt(0).toUpperCase()}${caseTitle.slice(1)}`;
  return { title: `${heading}: ${spec.title}`, caption: `${heading}: ${spec.title} over time, from the ride model.` };
}

/** The plot of one kind as data, or null where the series has no channel in its unit. */
export function ridePlot(c: RideCase, title: string, series: RideSeries, kind: RidePlotKind): PlotData | null {
  const spec = RIDE_PLOTS.find((p) => p.kind === kind)!;
  const channels = series.channels.filter(spec.pick);
  if (channels.length === 0) return null;
  const t = series.t_s;
  const [i, j] = sampleRange(t, eventWindow(t, series.channels.map((ch) => ch.values)));
  const shown = t.slice(i, j);
  return {
    id: `ride-${c}-${kind}`,
    ...ridePlotText(title, kind),
    xLabel: timeLabel(shown, t),
    yLabel: spec.yLabel,
    lines: channels.map((ch) => ({ label: ch.name, x: shown, y: ch.values.slice(i, j) })),
    rules: [],
  };
}

/** The time axis's title, with the part of the run shown where it is not all of it. */
export function timeLabel(shown: readonly number[], run: readonly number[]): string {
  const s = (v: number | undefined) => formatNumber(v ?? 0, 's');
  if (shown.length === run.length) return 'time (s)';
  return `time (s), showing ${s(shown[0])} to ${s(shown.at(-1))} s of a ${s(run.at(-1))} s run`;
}

/** The kinds of plot the series can fill. */
export function ridePlotKinds(series: RideSeries): RidePlotKind[] {
  return RIDE_PLOTS.filter((p) => series.channels.some(p.pick)).map((p) => p.kind);
}

/** The names of the plots the series can fill. */
export function ridePlotNames(c: RideCase, series: RideSeries): string[] {
  return ridePlotKinds(series).map((k) => ridePlotFile(c, k));
}

/** Every plot the series can fill, with its file name. */
export function ridePlotList(c: RideCase, title: string, series: RideSeries): [string, PlotData][] {
  const plots = RIDE_PLOTS.map((p) => [ridePlotFile(c, p.kind), ridePlot(c, title, series, p.kind)] as const);
  return plots.filter((p): p is readonly [string, PlotData] => p[1] !== null).map(([f, p]) => [f, p]);
}

/** Every plot the series can fill, with its file name, drawn to SVG. */
export function ridePlotFiles(c: RideCase, title: string, series: RideSeries): [string, string][] {
  return ridePlotList(c, title, series).map(([file, plot]) => [file, `${plotSvg(plot)}\n`]);
}
