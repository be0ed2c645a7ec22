// The ride command's report: the cases run, their plots beside it, the model's
// working; built as a report document and written as Markdown.

import type { RideCase } from '../core/ride/ride-types.ts';
import type { ReportDocument, Section } from './model/document.ts';
import { caseHeading, rideCaseBlocks, rideDampingBlocks, type RideCaseResult } from './model/ride-blocks.ts';
import { plain, workingLines } from './model/runs.ts';
import { renderMarkdown } from './markdown/render-markdown.ts';
import { RIDE_PLOTS, ridePlotFile } from './ride-plots.ts';

export interface RideReport {
  specName: string;
  cases: readonly (RideCaseResult & { working?: string[]; sources?: string[] })[];
  floorDampingUsed?: { value: number; source: string };
  /** Files written beside the report for each case: plots and CSV. */
  plots: (c: RideCase) => string[];
  csv: (c: RideCase) => string;
  cautions: readonly string[];
}

const LUMPED =
  'The ride model is lumped (one rigid body, point masses for the crew, springs and dampers for wheels, floor and yoke): it shows how the build responds, not what any one run will do.';

const section = (id: string, title: string, blocks: Section['blocks']): Section => ({ id, title, newPage: false, blocks });

export function rideDocument(r: RideReport): ReportDocument {
  const first = r.cases[0];
  const sources = [...new Set(r.cases.flatMap((c) => c.sources ?? []))];
  const kinds = (c: RideCase) => RIDE_PLOTS.filter((p) => r.plots(c).includes(ridePlotFile(c, p.kind))).map((p) => p.kind);
  return {
    title: `Ride model: ${r.specName}`,
    sections: [
      section('cautions', 'Cautions', [{ kind: 'cautions', items: [...r.cautions, LUMPED] }]),
      ...(r.floorDampingUsed ? [section('damping', 'Floor damping', rideDampingBlocks({ used: r.floorDampingUsed }))] : []),
      ...r.cases.map((c) => section(`ride-${c.case}`, caseHeading(c), rideCaseBlocks(c, kinds(c.case)))),
      section('series', 'Time series', [{ kind: 'list', items: r.cases.map((c) => [plain(`${c.case}: ${r.csv(c.case)} (one column per channel, units in the header)`)]) }]),
      ...(first?.working?.length ? [section('parameters', 'Model parameters', [workingLines(first.working)])] : []),
      ...(sources.length ? [section('sources', 'Sources', [{ kind: 'list' as const, items: sources.map((s) => [plain(s)]) }])] : []),
    ],
  };
}

export function rideMarkdown(r: RideReport): string {
  return renderMarkdown(rideDocument(r));
}
