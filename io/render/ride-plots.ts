// Plots of one ride case over time: the length channels (crew and wheel
// heights), the floor forces under the crew, and the other forces (wheels on
// the ground, the yoke). Floor forces are the force channels the ride model
// names "... floor force".
// The file names are shared by the ride command, the check's outputs and the
// report, which links them from Markdown and draws them inline in HTML.

import type { RideCase, RideChannel, RideSeries } from '../../src/ride/ride-types.ts';
import { linePlotSvg } from './line-plot-svg.ts';

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

/** The plot file named, if it is one of ours: the report's HTML draws it inline. */
export function parseRidePlotFile(name: string): { case: RideCase; kind: RidePlotKind } | undefined {
  const m = /^ride-(ridge|one-wheel|drop)-(heights|floor-forces|support-forces)\.svg$/.exec(name);
  return m ? { case: m[1] as RideCase, kind: m[2] as RidePlotKind } : undefined;
}

/** The plot of one kind, or null where the series has no channel in its unit. */
export function ridePlotSvg(title: string, series: RideSeries, kind: RidePlotKind): string | null {
  const spec = RIDE_PLOTS.find((p) => p.kind === kind)!;
  const channels = series.channels.filter(spec.pick);
  if (channels.length === 0) return null;
  return linePlotSvg({
    title: `${title}: ${spec.title}`,
    xLabel: 'time (s)',
    yLabel: spec.yLabel,
    lines: channels.map((c) => ({ label: c.name, x: series.t_s, y: c.values })),
  });
}

/** The names of the plots the series can fill. */
export function ridePlotNames(c: RideCase, series: RideSeries): string[] {
  return RIDE_PLOTS.filter((p) => series.channels.some(p.pick)).map((p) => ridePlotFile(c, p.kind));
}

/** Every plot the series can fill, with its file name. */
export function ridePlotFiles(c: RideCase, title: string, series: RideSeries): [string, string][] {
  return RIDE_PLOTS.flatMap((p) => {
    const svg = ridePlotSvg(title, series, p.kind);
    return svg === null ? [] : [[ridePlotFile(c, p.kind), `${svg}\n`] as [string, string]];
  });
}
