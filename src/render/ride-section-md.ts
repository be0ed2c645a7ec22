// The ride model's results as Markdown, for the ride command's report and the
// check report's ride section: per case the crew, the wheels, the yoke and the
// decay, then its plots as images linked beside the report.

import type { RideCase, RideResult } from '../core/ride/ride-types.ts';
import { escapeBlock, escapeInline as esc, fencedBlock, table } from './markdown-escape.ts';
import { formatNumber, UNIT_SPACE } from './number-format.ts';
import { RIDE_PLOTS, ridePlotFile } from './ride-plots.ts';

export type RideCaseResult = Omit<RideResult, 'series'>;

export interface RideSectionOptions {
  /** Markdown heading marks for each case, e.g. '###'. */
  level: string;
  floorDampingNeeded?: number | null;
  floorDampingUsed?: { value: number; source: string };
  floorDampingWorking?: string;
  /** The plot files written beside the report for a case. */
  plots: (c: RideCase) => string[];
}

export function rideSectionBlocks(cases: readonly RideCaseResult[], o: RideSectionOptions): string[] {
  return [...dampingLines(o), ...cases.flatMap((r) => caseBlocks(r, o))];
}

function dampingLines(o: RideSectionOptions): string[] {
  const lines: string[] = [];
  if (o.floorDampingUsed) lines.push(`Floor damping ratio used: ${formatNumber(o.floorDampingUsed.value, '')} (${esc(o.floorDampingUsed.source)}).`);
  if (o.floorDampingNeeded !== undefined) {
    lines.push(
      o.floorDampingNeeded === null
        ? 'Floor damping needed: no floor damping ratio meets the decay rule and keeps the crew on the floor over the design bump.'
        : `Floor damping needed: a damping ratio of at least ${formatNumber(o.floorDampingNeeded, '')} meets the decay rule and keeps the crew on the floor over the design bump (found by bisection over full runs).`,
    );
  }
  return [...(lines.length ? [lines.join('\n\n')] : []), ...(o.floorDampingWorking ? [fencedBlock(o.floorDampingWorking)] : [])];
}

function caseBlocks(r: RideCaseResult, o: RideSectionOptions): string[] {
  const crew = r.crew.map((c) => [esc(c.role), formatNumber(c.rise_mm, 'mm'), formatNumber(c.airborne_ms, 'ms'), formatNumber(c.floor_dlf, '')]);
  const wheels = r.wheels.map((w) => [w.wheel, formatNumber(w.airborne_ms, 'ms'), formatNumber(w.dlf, '')]);
  const decay =
    r.decayCycles === null
      ? "The crew's motion does not fall below 10 % of its first amplitude within the run."
      : `The crew's motion falls below 10 % of its first amplitude in ${formatNumber(r.decayCycles, 'cycles')} cycles.`;
  return [
    `${o.level} ${esc(caseHeading(r))}`,
    crew.length ? table(['Crew', 'Rise above standing (mm)', 'Time off the floor (ms)', 'Floor dynamic load factor'], crew, ['l', 'r', 'r', 'r']) : 'No crew.',
    table(['Wheel', 'Time off the ground (ms)', 'Ground dynamic load factor'], wheels, ['l', 'r', 'r']),
    `Yoke force: least ${formatNumber(r.yokeForceMin_N, 'N')}${UNIT_SPACE}N, greatest ${formatNumber(r.yokeForceMax_N, 'N')}${UNIT_SPACE}N. ${decay}`,
    escapeBlock(`Integration: ${r.method}, ${r.steps} steps.`),
    ...o.plots(r.case).map((file) => `![${esc(`${r.title}: ${plotTitle(file, r.case)}`)}](${file})`),
  ];
}

/** "Ridge across both tracks (ridge)": the model's title, then the case's id as the command line names it. */
export function caseHeading(r: RideCaseResult): string {
  return `${r.title.charAt(0).toUpperCase()}${r.title.slice(1)} (${r.case})`;
}

function plotTitle(file: string, c: RideCase): string {
  return RIDE_PLOTS.find((p) => ridePlotFile(c, p.kind) === file)?.title ?? file;
}
