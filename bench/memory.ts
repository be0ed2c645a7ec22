// Peak memory of whole commands: the resident set at its highest over the
// process's life, beside bare node's.
// Target: `axletree check <demo> --json` under 150 MiB, as a user runs it
// (through the bin's first line, with its Node options: bin-command.ts;
// with the decisive-input search, the default) and without the search (as
// a batch with --no-decisive, or a quick look, runs it).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { verdict } from './median.ts';
import { binArgs } from './bin-command.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const PEAK = fileURLToPath(new URL('peak-rss.mjs', import.meta.url));
export const MEMORY_TARGET_MIB = 150;

function peakMiB(args: string[], cwd: string): number {
  const r = spawnSync(process.execPath, ['--import', PEAK, ...args], { cwd, encoding: 'utf8', maxBuffer: 64 * 2 ** 20 });
  const kb = /peak-rss-kb (\d+)\s*$/.exec(r.stderr);
  if (!kb || r.status === null || r.status > 1) throw new Error(`node ${args.join(' ')} exited ${r.status}: ${r.stderr.slice(-400)}`);
  return Number(kb[1]) / 1024;
}

export function benchMemory(): number {
  const cwd = mkdtempSync(join(tmpdir(), 'axletree-memory-'));
  try {
    const node = peakMiB(['-e', '0'], cwd);
    console.log(`peak memory, whole processes, worst of 3: node -e 0 ${node.toFixed(0)} MiB`);
    let missed = 0;
    for (const extra of [[], ['--no-decisive']]) {
      const args = ['check', join(ROOT, 'specs', 'demo-two-crew.yaml'), '--json', ...extra];
      const peak = Math.max(...[0, 1, 2].map(() => peakMiB([...binArgs(), ...args], cwd)));
      const ok = peak < MEMORY_TARGET_MIB;
      if (!ok) missed++;
      console.log(`  axletree ${['check specs/demo-two-crew.yaml --json', ...extra].join(' ').padEnd(50)} ${peak.toFixed(0).padStart(4)} MiB (${(peak / node).toFixed(1)}x node)  target < ${MEMORY_TARGET_MIB} MiB ${verdict(ok)}`);
    }
    return missed;
  } finally {
    rmSync(cwd, { recursive: true, force: true });
  }
}
