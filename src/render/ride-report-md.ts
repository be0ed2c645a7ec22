// The ride command's report: the cases run, their plots beside it, the model's working.

import type { RideCase } from '../core/ride/ride-types.ts';
import { escapeBlock, escapeInline as esc, fencedBlock } from './markdown-escape.ts';
import { rideSectionBlocks, type RideCaseResult } from './ride-section-md.ts';

export interface RideReport {
  specName: string;
  cases: readonly (RideCaseResult & { working?: string[]; sources?: string[] })[];
  floorDampingUsed?: { value: number; source: string };
  /** Files written beside the report for each case: plots and CSV. */
  plots: (c: RideCase) => string[];
  csv: (c: RideCase) => string;
  cautions: readonly string[];
}

export function rideMarkdown(r: RideReport): string {
  const first = r.cases[0];
  const sources = [...new Set(r.cases.flatMap((c) => c.sources ?? []))];
  const blocks = [
    `# Ride model: ${esc(r.specName)}`,
    '## Cautions',
    [
      ...r.cautions.map((c) => `- ${escapeBlock(c)}`),
      '- The ride model is lumped (one rigid body, point masses for the crew, springs and dampers for wheels, floor and yoke): it shows how the build responds, not what any one run will do.',
    ].join('\n'),
    ...rideSectionBlocks(r.cases, { level: '##', floorDampingUsed: r.floorDampingUsed, plots: r.plots }),
    '## Time series',
    r.cases.map((c) => `- ${esc(c.case)}: ${esc(r.csv(c.case))} (one column per channel, units in the header)`).join('\n'),
    ...(first?.working?.length ? ['## Model parameters', fencedBlock(first.working.join('\n'))] : []),
    ...(sources.length ? ['## Sources', sources.map((s, i) => `${i + 1}. ${escapeBlock(s)}`).join('\n')] : []),
  ];
  return `${blocks.join('\n\n')}\n`;
}
