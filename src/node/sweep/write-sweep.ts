import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { sweepFiles } from '../../render/sweep/sweep-files.ts';
import { sweepPlotSpec } from '../../render/sweep/sweep-plot.ts';
import { steadySvgIds } from '../../render/plots/steady-svg-ids.ts';
import { writeFileSet } from '../write-file-set.ts';

/** Every file of the sweep's output set, the picture drawn (vega loads only here). */
export async function renderSweep(r: SweepResult): Promise<[string, string][]> {
  const plot = sweepPlotSpec(r);
  if (!plot) return sweepFiles(r, null);
  const { vegaLiteSvg } = await import('../../render/plots/vega-svg.mjs');
  return sweepFiles(r, { svg: steadySvgIds(await vegaLiteSvg(plot.spec)), caption: plot.caption });
}

/** The sweep written as one set (manifest last); returns the paths written. */
export async function writeSweep(dir: string, r: SweepResult, inputPath: string): Promise<string[]> {
  return writeFileSet(dir, await renderSweep(r), inputPath);
}
