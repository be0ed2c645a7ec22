// Writing the report after the check, as `axletree check` does it: every
// output rendered and written as one set (Markdown, HTML, the plots, the drawings, the workbook, JSON).
// Target: under 0.5 s after the check.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import type { CheckResult } from '../src/core/result/check-result.ts';
import { writeOutputs } from '../src/node/write-outputs.ts';
import { verdict } from './median.ts';

export const OUTPUTS_TARGET_MS = 500;
const RUNS = 5;

export async function benchOutputs(name: string, check: () => CheckResult, yardstick: number): Promise<number> {
  const dir = mkdtempSync(join(tmpdir(), 'axletree-bench-out-'));
  const times: number[] = [];
  try {
    for (let i = 0; i <= RUNS; i++) {
      const result = check();
      const t0 = performance.now();
      await writeOutputs(result, join(dir, 'out'), join(dir, 'spec.yaml'));
      if (i > 0) times.push(performance.now() - t0);
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  const median = times.sort((a, b) => a - b)[Math.floor(RUNS / 2)];
  const ok = median < OUTPUTS_TARGET_MS;
  console.log(`  ${name.padEnd(38)} every output written after the check: median ${median.toFixed(0)} ms (${(median / yardstick).toFixed(1)} yardsticks) of ${RUNS}  target < ${OUTPUTS_TARGET_MS} ms ${verdict(ok)}`);
  return ok ? 0 : 1;
}
