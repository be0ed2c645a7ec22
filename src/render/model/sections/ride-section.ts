import type { CheckResult } from '../../../core/result/check-result.ts';
import { ridePlotKinds } from '../../ride-plots.ts';
import type { Section } from '../document.ts';
import { caseHeading, rideCaseBlocks, ridePlotFigures, rideDampingBlocks } from '../ride-blocks.ts';
import { code, heading, paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

/** The ride model's cases, where it ran: the damping, then each case's tables; the plots are in the appendix (ridePlotsSection). */
export function rideSection(result: CheckResult): Section[] {
  const ride = result.ride;
  if (!ride) return [];
  return [
    section('ride', [
      paragraph(
        'The lumped ride model (design basis, section 8, in docs/design-basis.md): the crew over the routine rough ground and the stone at the design speed, each across both tracks and under one wheel, and a drop onto rigid ground. ',
        'Heights are from the standing position; a dynamic load factor is the peak force over the standing force. The full time series come from ',
        code('axletree ride'),
        '; the plots of each case are in the appendix.',
      ),
      heading(3, 'Floor damping'),
      ...rideDampingBlocks({ needed: ride.floor_damping_ratio_needed, used: ride.floor_damping_ratio_used, working: ride.floor_damping_working }),
      ...ride.cases.flatMap((c) => [heading(3, caseHeading(c)), ...rideCaseBlocks(c, [])]),
    ]),
  ];
}

/** Each ride case's plots (the result's thinned series, drawn to files beside the report), where the model ran. */
export function ridePlotsSection(result: CheckResult): Section[] {
  const cases = result.ride?.cases ?? [];
  const blocks = cases.flatMap((c) => {
    const kinds = ridePlotKinds(c.plot);
    return kinds.length === 0 ? [] : [heading(3, caseHeading(c)), ...ridePlotFigures(c, kinds)];
  });
  return blocks.length ? [section('ridePlots', blocks)] : [];
}
