import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { sweepFiles } from '../../render/sweep/sweep-files.ts';
import { sweepPlot } from '../../render/sweep/sweep-plot.ts';
import { writeFileSet } from '../write-file-set.ts';

/** Every file of the sweep's output set, its picture drawn. */
export function renderSweep(r: SweepResult): [string, string][] {
  return sweepFiles(r, sweepPlot(r));
}

/** The sweep written as one set (manifest last); returns the paths written. */
export async function writeSweep(dir: string, r: SweepResult, inputPath: string): Promise<string[]> {
  return writeFileSet(dir, renderSweep(r), inputPath);
}
