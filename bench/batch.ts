// The batch review as a user runs it: one whole process,
// `axletree check <every spec in specs/ and specs/validation/>`, writing
// each proposal's outputs and the review table (the decisive search on, at
// the batch's work limit; --jobs at its default, the number of cores).
// Target: under 10 s on this two-core machine. Printed beside bare node's
// start, run in the same loop, as a ratio. Each run is timed after one untimed
// run that warms the file cache and tsx's cache.
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { BATCH_WORK_LIMIT } from '../src/core/review/batch-work-limit.ts';
import { median, verdict } from './median.ts';
import { binArgs, ranBundle, timeProcess } from './bin-command.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
export const BATCH_TARGET_MS = 10_000;
const RUNS = 3;

/** Every specification the batch target names: specs/ and specs/validation/. */
export function batchSpecs(): string[] {
  return ['specs', join('specs', 'validation')].flatMap((d) =>
    readdirSync(join(ROOT, d))
      .filter((f) => /\.(ya?ml|json|xlsx)$/.test(f))
      .sort()
      .map((f) => join(ROOT, d, f)),
  );
}

/** Prints the batch's time against its target; answers the number of targets missed. */
export function benchBatch(): number {
  const cwd = mkdtempSync(join(tmpdir(), 'axletree-batch-'));
  try {
    const specs = batchSpecs();
    const args = [...binArgs(), 'check', ...specs, '--out', 'review'];
    const first = timeProcess(args, cwd);
    const bundled = ranBundle(first.err);
    const node = median(Array.from({ length: 5 }, () => timeProcess(['-e', '0'], cwd).ms));
    const runs = Array.from({ length: RUNS }, () => timeProcess(args, cwd));
    const ms = median(runs.map((r) => r.ms));
    const cpus = runs.flatMap((r) => (r.cpuMs === null ? [] : [r.cpuMs]));
    const ok = ms < BATCH_TARGET_MS;
    const cores = availableParallelism();
    console.log(`batch review, one whole process (${bundled ? 'the built bundle, dist/' : 'from the TypeScript source: dist/ is missing or stale, `npm run build` first'}; ${cores} cores, load average ${loadavg()[0].toFixed(1)} before):`);
    console.log(`  axletree check <${specs.length} specs of specs/ and specs/validation/> (decisive work limit ${BATCH_WORK_LIMIT}, --jobs ${cores})  median ${ms.toFixed(0)} ms of ${RUNS}  ${(ms / node).toFixed(0)}x node (${node.toFixed(0)} ms)  target < ${BATCH_TARGET_MS} ms ${verdict(ok)}`);
    // What the run would take with its cores to itself: its CPU time shared out over them (a floor; the last proposal may run alone).
    if (cpus.length) console.log(`  its CPU time, every thread: median ${median(cpus).toFixed(0)} ms; over ${cores} cores ${(median(cpus) / cores).toFixed(0)} ms (the time on an otherwise idle machine, at best)`);
    return ok ? 0 : 1;
  } finally {
    rmSync(cwd, { recursive: true, force: true });
  }
}

if (process.argv[1] === fileURLToPath(import.meta.url)) process.exitCode = benchBatch() ? 1 : 0;
