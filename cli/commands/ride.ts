import { basename, extname, join, resolve } from 'node:path';
import { rideCsv } from '../../src/render/ride-csv.ts';
import { ridePlotFiles } from '../../src/render/ride-plots.ts';
import { rideMarkdown } from '../../src/render/ride-report-md.ts';
import { writeFileSet } from '../../src/node/write-file-set.ts';
import { CAUTIONS } from '../../src/core/cautions.ts';
import { ModelGraph } from '../../src/core/pipeline/model-graph.ts';
import { floorDampingOf } from '../../src/core/ride/ride-build.ts';
import { RIDE_CASES, rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';
import type { RideCase, RideResult } from '../../src/core/ride/ride-types.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { loadData } from '../load-data.ts';
import { readPreparedSpec } from '../read-prepared-spec.ts';
import { writeOrRefuse } from '../write-or-refuse.ts';

export interface RideOptions {
  case?: string;
  out?: string;
  json: boolean;
}

export const RIDE_REPORT_FILE = 'ride.md';
export const rideCsvFile = (c: RideCase) => `ride-${c}.csv`;

/** `axletree ride <spec> [--case CASE] [--out DIR] [--json]`: the ride model's time series, plots and report. */
export async function rideCommand(file: string, opts: RideOptions, con: Console): Promise<number> {
  if (opts.case !== undefined && !(RIDE_CASES as readonly string[]).includes(opts.case)) {
    con.err(`axletree ride: unknown case "${opts.case}"; cases: ${RIDE_CASES.join(', ')}.\n`);
    return EXIT.badInput;
  }
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const input = resolve(con.cwd, file);
  const got = await readPreparedSpec(file, input, data, con);
  if (!got) return EXIT.badInput;
  const { prepared } = got;
  const rideIn = new ModelGraph(MODELS, { spec: prepared.spec, data, ride: true }).get('rideInput');
  const cases = opts.case ? [opts.case as RideCase] : [...RIDE_CASES];
  const results = cases.map((c) => rideCaseOf(rideIn, c));
  const plots = new Map(results.map((r) => [r.case, ridePlotFiles(r.case, r.title, r.series)] as const));
  const report = rideMarkdown({
    specName: prepared.spec.name,
    cases: results,
    floorDampingUsed: floorDampingOf(rideIn),
    plots: (c) => (plots.get(c) ?? []).map(([name]) => name),
    csv: rideCsvFile,
    cautions: CAUTIONS,
  });
  const files: [string, string][] = [
    [RIDE_REPORT_FILE, report],
    ...results.flatMap((r): [string, string][] => [[rideCsvFile(r.case), rideCsv(r.series)], ...(plots.get(r.case) ?? [])]),
  ];
  const dir = resolve(con.cwd, opts.out ?? join('axletree-out', basename(file, extname(file)), 'ride'));
  const written = await writeOrRefuse(() => writeFileSet(dir, files, input), con);
  if (written === null) return EXIT.badInput;
  const text = rideSummaryText(prepared.spec.name, results, written);
  if (opts.json) {
    // The long series are left out; they are in the CSV files named here.
    const cases = results.map(({ series: _series, ...rest }) => ({ ...rest, series_csv: join(dir, rideCsvFile(rest.case)) }));
    con.out(JSON.stringify({ spec_name: prepared.spec.name, series: 'omitted; see series_csv', cases }, null, 2) + '\n');
    con.err(text);
  } else {
    con.out(text);
  }
  return EXIT.ok;
}

function rideSummaryText(name: string, results: readonly RideResult[], written: string[]): string {
  const lines = results.map((r) => {
    if (r.stopped) return `  ${r.case}: not run: ${r.stopped}`;
    const crew = r.crew.map((c) => `${c.role} rise ${c.rise_mm.toFixed(1)} mm, off the floor ${c.airborne_ms.toFixed(1)} ms, floor DLF ${c.floor_dlf.toFixed(2)}`).join('; ');
    const decay = r.decayCycles === null ? 'no decay to 10 % in the run' : `${r.decayCycles.toFixed(1)} cycles to 10 %`;
    return `  ${r.case}: ${crew}; yoke ${r.yokeForceMin_N.toFixed(0)} to ${r.yokeForceMax_N.toFixed(0)} N; ${decay}`;
  });
  return [`${name}: ride model`, ...lines, 'written:', ...written.map((w) => `  ${w}`)].join('\n') + '\n';
}
