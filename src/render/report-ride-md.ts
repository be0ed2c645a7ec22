// The check report's ride section. The plots, drawn from the result's thinned
// series, are linked as SVG files written beside report.md; the HTML report
// holds them inline (src/render/report-plots.ts).

import type { CheckResult } from '../core/result/check-result.ts';
import { SECTIONS } from './report-sections.ts';
import { ridePlotNames } from './ride-plots.ts';
import { rideSectionBlocks } from './ride-section-md.ts';

export function rideSections(result: CheckResult): string[] {
  const ride = result.ride;
  if (!ride) return [];
  const plots = new Map(ride.cases.map((c) => [c.case, ridePlotNames(c.case, c.plot)]));
  return [
    `## ${SECTIONS.ride.title}`,
    'The lumped ride model (mechanics note, section 8): the crew over a ridge across both tracks, a bump under one wheel, and a drop onto rigid ground. Heights are from the standing position; a dynamic load factor is the peak force over the standing force. The full time series come from `axletree ride`.',
    ...rideSectionBlocks(ride.cases, {
      level: '###',
      floorDampingNeeded: ride.floor_damping_ratio_needed,
      floorDampingUsed: ride.floor_damping_ratio_used,
      floorDampingWorking: ride.floor_damping_working,
      plots: (c) => plots.get(c) ?? [],
    }),
  ];
}

