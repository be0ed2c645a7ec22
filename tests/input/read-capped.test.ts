// Reading an input file: only a regular file, only up to its cap, and never
// waiting on a pipe.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readCapped } from '../../src/node/read-capped.ts';

const dir = mkdtempSync(join(tmpdir(), 'axletree-read-capped-'));

describe('reading an input file', () => {
  it('reads a file of exactly the cap and refuses one byte more, naming both sizes', async () => {
    writeFileSync(join(dir, 'at.yaml'), 'x'.repeat(2000));
    writeFileSync(join(dir, 'over.yaml'), 'x'.repeat(2001));
    const at = await readCapped(join(dir, 'at.yaml'), 2000, 'a YAML file');
    expect(at.ok && at.bytes.length).toBe(2000);
    const over = await readCapped(join(dir, 'over.yaml'), 2000, 'a YAML file');
    expect(over).toEqual({ ok: false, key: 'fileTooBig', params: { path: join(dir, 'over.yaml'), size: '2.001 kB', what: 'a YAML file', max: '2 kB' } });
  });

  it('reads a file larger than one read at a time whole', async () => {
    const text = Array.from({ length: 50_000 }, (_, i) => `line ${i}\n`).join('');
    writeFileSync(join(dir, 'long.yaml'), text);
    const r = await readCapped(join(dir, 'long.yaml'), 1e6, 'a YAML file');
    expect(r.ok && r.bytes.toString('utf8')).toBe(text);
  });

  it('refuses a named pipe at once, with no writer on its other end', async () => {
    execFileSync('mkfifo', [join(dir, 'pipe.yaml')]);
    const started = performance.now();
    const r = await readCapped(join(dir, 'pipe.yaml'), 1000, 'a YAML file');
    expect(r.ok ? 'read' : r.key).toBe('fileNotRegular');
    expect(!r.ok && r.params.kind).toBe('a named pipe');
    expect(performance.now() - started).toBeLessThan(1000);
  });

  it('refuses a character device such as /dev/zero, which never ends', async () => {
    const r = await readCapped('/dev/zero', 1000, 'a YAML file');
    expect(r.ok ? 'read' : r.params.kind).toBe('a character device');
  });

  it('tells a missing file and a directory from an unreadable one', async () => {
    expect((await readCapped(join(dir, 'none.yaml'), 10, 'a YAML file')) as object).toMatchObject({ ok: false, key: 'fileMissing' });
    expect((await readCapped(dir, 10, 'a YAML file')) as object).toMatchObject({ ok: false, key: 'fileIsDirectory' });
  });
});
