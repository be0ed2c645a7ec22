// An output set: each file written atomically, the manifest last, the
// previous set's stale files removed after it, an interrupted run's temporary
// files cleared on the next start, other commands' files left alone, and a
// set trusted only while its manifest matches its files.
import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MANIFEST, setIsComplete, writeFileSet } from '../src/node/write-file-set.ts';

const fresh = () => mkdtempSync(join(tmpdir(), 'axletree-set-'));
const INPUT = join(tmpdir(), 'no-such-input.yaml');

describe('output sets', () => {
  it('writes the files, then a manifest of their sizes and hashes', async () => {
    const dir = fresh();
    const written = await writeFileSet(dir, [['a.md', 'alpha\n'], ['b.json', '{}\n']], INPUT);
    expect(written.map((p) => p.slice(dir.length + 1))).toEqual(['a.md', 'b.json', MANIFEST]);
    const m = JSON.parse(readFileSync(join(dir, MANIFEST), 'utf8')) as { files: { name: string; bytes: number; sha256: string }[] };
    // sha256 of "alpha\n", computed apart with coreutils' sha256sum.
    expect(m.files[0]).toEqual({ name: 'a.md', bytes: 6, sha256: 'b6a98d9ce9a2d9149288fa3df42d377c3e42737afdcdaf714e33c0a100b51060' });
    expect(await setIsComplete(dir)).toBe(true);
  });

  it("removes the previous set's files that the new set no longer has, and leaves other commands' files", async () => {
    const dir = fresh();
    await writeFileSet(dir, [['old.svg', '<svg/>'], ['keep.md', 'one']], INPUT);
    mkdirSync(join(dir, 'ride'));
    writeFileSync(join(dir, 'ride', 'ride.md'), 'the ride command owns this');
    writeFileSync(join(dir, 'notes.txt'), 'the user put this here');
    await writeFileSet(dir, [['keep.md', 'two']], INPUT);
    expect(existsSync(join(dir, 'old.svg'))).toBe(false);
    expect(readFileSync(join(dir, 'keep.md'), 'utf8')).toBe('two');
    expect(readFileSync(join(dir, 'ride', 'ride.md'), 'utf8')).toBe('the ride command owns this');
    expect(readFileSync(join(dir, 'notes.txt'), 'utf8')).toBe('the user put this here');
  });

  it('clears the temporary files of an interrupted run on the next start', async () => {
    const dir = fresh();
    writeFileSync(join(dir, '.report.html.0123456789ab.tmp'), 'half a report');
    await writeFileSet(dir, [['report.html', '<p>whole</p>']], INPUT);
    expect(existsSync(join(dir, '.report.html.0123456789ab.tmp'))).toBe(false);
  });

  it('is not trusted once a file no longer matches its manifest (a run stopped part way)', async () => {
    const dir = fresh();
    await writeFileSet(dir, [['a.md', 'first'], ['b.md', 'first']], INPUT);
    // A later run replaced a.md and was stopped before its manifest.
    writeFileSync(join(dir, 'a.md'), 'second');
    expect(await setIsComplete(dir)).toBe(false);
  });
});

describe('a stop asked for while a set is swapped into place', () => {
  it('waits for the end of the critical section, and runs at once outside one', async () => {
    const { critical, whenSafe } = await import('../src/node/critical-section.ts');
    const order: string[] = [];
    await critical(async () => {
      order.push('renames begin');
      whenSafe(() => order.push('stop'));
      await Promise.resolve();
      order.push('renames end');
    });
    whenSafe(() => order.push('stop outside'));
    expect(order).toEqual(['renames begin', 'renames end', 'stop', 'stop outside']);
  });
});
