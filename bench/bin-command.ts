// The command as a user runs it: `axletree` (npx or an installed bin) starts
// Node through the bin's first line, with the Node options written there.
// The whole-process benches run it the same way, so what they measure is
// what a user gets, with the flags kept in one place (bin/axletree.mjs).
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'axletree.mjs');

/** The Node options on a script's first line: `#!/usr/bin/env -S node <options>` or `#!/usr/bin/env node`. */
export function shebangNodeOptions(firstLine: string): string[] {
  const m = /^#!\s*\/usr\/bin\/env\s+(?:-S\s+)?node((?:\s+\S+)*)\s*$/.exec(firstLine);
  if (!m) throw new Error(`not a line that starts node through env: ${firstLine}`);
  return m[1].split(/\s+/).filter(Boolean);
}

/** The arguments after `node` that run the bin as its first line does: its Node options, then the bin. */
export function binArgs(): string[] {
  return [...shebangNodeOptions(readFileSync(BIN, 'utf8').split('\n', 1)[0]), BIN];
}

/** GNU time, where installed: the process's CPU seconds (every thread), which a loaded machine stretches less than the clock. */
const GNU_TIME = '/usr/bin/time';
const CPU_LINE = /^axletree-cpu (\S+) (\S+)$/m;

/** One whole process of `node <args>`: its time by the clock, its CPU time (null without GNU time) and its stderr. */
export function timeProcess(args: string[], cwd: string): { ms: number; cpuMs: number | null; err: string } {
  const timed = existsSync(GNU_TIME);
  const t0 = performance.now();
  const r = timed
    ? spawnSync(GNU_TIME, ['-f', 'axletree-cpu %U %S', process.execPath, ...args], { cwd, encoding: 'utf8', maxBuffer: 64 * 2 ** 20 })
    : spawnSync(process.execPath, args, { cwd, encoding: 'utf8', maxBuffer: 64 * 2 ** 20 });
  const ms = performance.now() - t0;
  // 0 and 1 are verdicts; anything else means the run did not do its work.
  if (r.error || r.status === null || r.status > 1) throw new Error(`node ${args.join(' ')} exited ${r.status}: ${r.error?.message ?? r.stderr}`);
  const cpu = CPU_LINE.exec(r.stderr);
  return { ms, cpuMs: cpu ? (Number(cpu[1]) + Number(cpu[2])) * 1000 : null, err: r.stderr };
}

/** Whether a run of the bin ran the built bundle (dist/), not the sources (the bin says so on stderr when dist/ is stale). */
export function ranBundle(err: string): boolean {
  return existsSync(join(ROOT, 'dist', 'axletree.mjs')) && !err.includes('dist/');
}
