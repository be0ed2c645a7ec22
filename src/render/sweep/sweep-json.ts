import type { SweepResult } from '../../core/sweep/sweep-result.ts';

/** sweep.json: the result as it stands, two-space indented; it holds no clock time, so equal sweeps give equal bytes. */
export function sweepJson(r: SweepResult): string {
  return `${JSON.stringify(r, null, 2)}\n`;
}
