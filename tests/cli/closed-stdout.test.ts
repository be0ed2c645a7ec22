// A reader that closes stdout early (`axletree check --json | head`) is not a
// fault: the run finishes, writes its outputs and exits with its own code,
// with no stack trace. Node reports the closed pipe as EPIPE on stdout.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { freshDir, REPO } from '../support/run-cli.ts';

function runWithStdoutClosed(argv: string[], cwd: string): Promise<{ code: number | null; err: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [join(REPO, 'bin', 'axletree.mjs'), ...argv], { cwd, stdio: ['ignore', 'pipe', 'pipe'] });
    // Closed before the first byte, as `head -c 0` would.
    child.stdout.destroy();
    let err = '';
    child.stderr.on('data', (b: Buffer) => (err += b.toString()));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, err }));
  });
}

describe('stdout closed by the reader', () => {
  it('check --json still writes its output set and exits with the verdict\'s code', async () => {
    const dir = await freshDir('axletree-epipe-');
    const r = await runWithStdoutClosed(['check', join(REPO, 'specs', 'demo-two-crew.yaml'), '--json', '--no-decisive', '--out', 'out'], dir);
    expect(r.err).not.toMatch(/EPIPE|Unhandled|\n\s+at .+:\d+:\d+/);
    // The demo's verdict is advice: exit 0.
    expect(r.code).toBe(0);
    expect(existsSync(join(dir, 'out', 'manifest.json'))).toBe(true);
  }, 120_000);
});
