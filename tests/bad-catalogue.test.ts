// The bad-input catalogue: every case in tests/fixtures/bad/ run as a user
// would, in a fresh folder. Each gives its exit code and message; a refused
// input (exit 2) writes nothing and leaves its files as they were; no output
// holds NaN or Infinity; nothing crashes (exit 3) or hangs.
import { describe, expect, it } from 'vitest';
import { chmodSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { prepareCase, readCase } from './support/bad-case.ts';
import { freshDir, runBinary, runCli } from './support/run-cli.ts';

const DIR = new URL('./fixtures/bad/', import.meta.url);
const files = readdirSync(DIR).filter((f) => f.endsWith('.case.yaml')).sort();

/** Every file under dir, with its bytes. */
function snapshot(dir: string): Map<string, string> {
  const out = new Map<string, string>();
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      const s = statSync(p);
      if (s.isDirectory()) {
        try {
          walk(p);
        } catch {
          out.set(p, '(unreadable folder)');
        }
      } else if (s.isFile()) out.set(p, readFileSync(p).toString('base64'));
      else out.set(p, '(special file)');
    }
  };
  walk(dir);
  return out;
}

describe('the bad-input catalogue', () => {
  it('holds cases', () => expect(files.length).toBeGreaterThan(0));
  for (const f of files) {
    const c = readCase(join(DIR.pathname, f));
    const asRoot = c.notAsRoot === true && process.getuid?.() === 0;
    if (asRoot) console.warn(`bad-catalogue: "${c.name}" skipped: permissions do not bind the superuser this test runs as`);
    it.skipIf(asRoot)(`${c.name}: exit ${c.exit}`, async () => {
      const dir = await freshDir('axletree-bad-case-');
      await prepareCase(c, dir);
      const before = snapshot(dir);
      const r = c.binary ? runBinary(c.argv, dir) : await runCli(c.argv, dir);
      try {
        expect(r.code, `${c.what}\n${r.err}${r.out}`).toBe(c.exit);
        if (c.message) expect(r.err + r.out).toContain(c.message);
        expect(r.err + r.out).not.toMatch(/\n\s+at .+:\d+:\d+\)?\n/); // no stack trace
        const after = snapshot(dir);
        // Inputs are never written to; a refused input writes nothing at all.
        for (const [p, bytes] of before) expect(after.get(p), `${p} changed`).toBe(bytes);
        if (c.exit === 2) expect([...after.keys()].filter((p) => !before.has(p))).toEqual([]);
        for (const [p, bytes] of after)
          if (!before.has(p) && /\.(json|md|html|csv)$/.test(p)) expect(Buffer.from(bytes, 'base64').toString('utf8'), p).not.toMatch(/\bNaN\b|\bInfinity\b/);
      } finally {
        for (const s of c.setup ?? []) if (s.startsWith('readonly:')) chmodSync(join(dir, s.slice('readonly:'.length)), 0o755);
      }
    }, 60_000);
  }
});
