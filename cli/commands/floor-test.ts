import { basename, extname, join, resolve } from 'node:path';
import { readDropCsvFile } from '../../src/node/read-drop-csv.ts';
import { floorTestPlotSvg } from '../../src/render/floor-test-plot.ts';
import { floorTestMarkdown } from '../../src/render/floor-test-report-md.ts';
import { writeFileSet } from '../../src/node/write-file-set.ts';
import { say } from '../../src/core/diagnostics/messages.ts';
import { estimateFloorTest } from '../../src/core/floor-test/estimate-floor-test.ts';
import { FloorTestError, type FloorTestEstimate } from '../../src/core/floor-test/floor-test-types.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { writeOrRefuse } from '../write-or-refuse.ts';

export interface FloorTestOptions {
  massKg?: string;
  out?: string;
  json: boolean;
}

export const FLOOR_TEST_FILES = { report: 'floor-test.md', plot: 'floor-test.svg' } as const;

/** `axletree floor-test <file.csv> --mass-kg M [--out DIR] [--json]`: frequency, damping and stiffness of a floor sample. */
export async function floorTestCommand(file: string, opts: FloorTestOptions, con: Console): Promise<number> {
  const mass = Number(opts.massKg);
  if (opts.massKg === undefined || opts.massKg.trim() === '' || !(mass > 0) || !Number.isFinite(mass)) {
    const m = say('floorTestMass', { value: opts.massKg ?? 'nothing' });
    con.err(`axletree floor-test: ${m.text} [${m.code}]\n`);
    return EXIT.badInput;
  }
  const input = resolve(con.cwd, file);
  const read = await readDropCsvFile(input);
  if (!read.ok) {
    con.err(formatIssues(file, read.issues));
    return EXIT.badInput;
  }
  let estimate: FloorTestEstimate;
  try {
    estimate = estimateFloorTest(read.record, mass);
  } catch (e) {
    if (!(e instanceof FloorTestError)) throw e;
    con.err(formatIssues(file, [{ path: [], code: e.code, message: e.message }]));
    return EXIT.badInput;
  }
  const name = basename(file, extname(file));
  const dir = resolve(con.cwd, opts.out ?? join('axletree-out', name));
  const files: [string, string][] = [
    [FLOOR_TEST_FILES.report, floorTestMarkdown(basename(file), estimate, FLOOR_TEST_FILES.plot, read.ignored)],
    [FLOOR_TEST_FILES.plot, `${floorTestPlotSvg(read.record, estimate)}\n`],
  ];
  const written = await writeOrRefuse(() => writeFileSet(dir, files, input), con);
  if (written === null) return EXIT.badInput;
  const text = floorTestSummary(file, estimate, written);
  if (opts.json) {
    con.out(JSON.stringify(estimate, null, 2) + '\n');
    con.err(text);
  } else {
    con.out(text);
  }
  return EXIT.ok;
}

function floorTestSummary(file: string, e: FloorTestEstimate, written: string[]): string {
  return [
    `${file}: floor drop test with ${e.mass_kg} kg`,
    `natural frequency ${e.natural_frequency_hz.toFixed(3)} Hz, damping ratio ${e.damping_ratio.toFixed(4)} (fit; log decrement ${e.damping_ratio_log_decrement.toFixed(4)}), stiffness ${e.stiffness_N_per_mm.toFixed(2)} N/mm`,
    `free vibration ${e.free_vibration.start_s.toFixed(3)} to ${e.free_vibration.end_s.toFixed(3)} s, ${e.free_vibration.half_cycles} half-cycles above the noise (${e.noise_mm.toFixed(3)} mm)`,
    ...e.notes.map((n) => `note: ${n}`),
    'written:',
    ...written.map((w) => `  ${w}`),
  ].join('\n') + '\n';
}
