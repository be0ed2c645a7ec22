import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { link, mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Faults injected into the file system the writer uses, switched on per test.
const faults = vi.hoisted(() => ({ rename: false, midWrite: false }));

vi.mock('node:fs/promises', async (importOriginal) => {
  const actual = await importOriginal<typeof import('node:fs/promises')>();
  return {
    ...actual,
    rename: async (from: string, to: string) => {
      if (faults.rename) throw Object.assign(new Error('injected rename failure'), { code: 'EIO' });
      return actual.rename(from, to);
    },
    open: async (...args: Parameters<typeof actual.open>) => {
      const handle = await actual.open(...args);
      if (faults.midWrite && args[1] === 'wx') {
        // Write part of the data, then fail as a full disk would.
        handle.writeFile = async (data: string | Uint8Array) => {
          await handle.write(String(data).slice(0, 10));
          throw Object.assign(new Error('injected disk full'), { code: 'ENOSPC' });
        };
      }
      return handle;
    },
  };
});

const { ensureNotSame, OutputIsInputError, writeFileAtomic } = await import('../src/node/atomic-write.ts');

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'atomic-write-'));
  faults.rename = false;
  faults.midWrite = false;
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('writeFileAtomic', () => {
  it('creates a new file and replaces an old one, leaving no temporary file', async () => {
    const target = join(dir, 'report.md');
    await writeFileAtomic(target, 'first');
    expect(await readFile(target, 'utf8')).toBe('first');
    await writeFileAtomic(target, new TextEncoder().encode('second'));
    expect(await readFile(target, 'utf8')).toBe('second');
    expect(await readdir(dir)).toEqual(['report.md']);
  });

  it('lets a reader see only the whole old or the whole new content', async () => {
    const target = join(dir, 'big.bin');
    const size = 16 * 1024 * 1024;
    const before = Buffer.alloc(size, 0x61);
    const after = Buffer.alloc(size, 0x62);
    await writeFile(target, before);
    let done = false;
    const writing = writeFileAtomic(target, after).finally(() => {
      done = true;
    });
    const seen: string[] = [];
    while (!done) {
      const content = await readFile(target);
      seen.push(content.equals(before) ? 'old' : content.equals(after) ? 'new' : `torn (${content.length} bytes)`);
    }
    await writing;
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.filter((s) => s !== 'old' && s !== 'new')).toEqual([]);
    expect((await readFile(target)).equals(after)).toBe(true);
  });

  it('keeps the old content and removes the temporary file when the rename fails', async () => {
    const target = join(dir, 'sheet.xlsx');
    await writeFile(target, 'old');
    faults.rename = true;
    await expect(writeFileAtomic(target, 'new')).rejects.toThrow(/injected rename failure/);
    expect(await readFile(target, 'utf8')).toBe('old');
    expect(await readdir(dir)).toEqual(['sheet.xlsx']);
  });

  it('keeps the old content and removes the partial temporary file when writing fails', async () => {
    const target = join(dir, 'report.html');
    await writeFile(target, 'old');
    faults.midWrite = true;
    await expect(writeFileAtomic(target, 'a much longer new content')).rejects.toThrow(/disk full/);
    expect(await readFile(target, 'utf8')).toBe('old');
    expect(await readdir(dir)).toEqual(['report.html']);
  });

  it('fails without leaving anything when the target is a directory', async () => {
    const target = join(dir, 'out');
    await mkdir(join(target, 'inner'), { recursive: true });
    await expect(writeFileAtomic(target, 'x')).rejects.toThrow();
    expect(await readdir(dir)).toEqual(['out']);
  });

  it('writes through a symbolic link and keeps the link', async () => {
    const real = join(dir, 'real.md');
    const alias = join(dir, 'alias.md');
    await writeFile(real, 'old');
    await symlink(real, alias);
    await writeFileAtomic(alias, 'new');
    expect(await readFile(real, 'utf8')).toBe('new');
    expect((await readdir(dir)).sort()).toEqual(['alias.md', 'real.md']);
  });
});

describe('ensureNotSame', () => {
  it('refuses an output that is the input, however it is spelt', async () => {
    const input = join(dir, 'spec.yaml');
    await writeFile(input, 'spec_version: 1\n');
    await mkdir(join(dir, 'sub'));
    expect(() => ensureNotSame(input, input)).toThrow(OutputIsInputError);
    expect(() => ensureNotSame(input, join(dir, 'sub', '..', 'spec.yaml'))).toThrow(OutputIsInputError);
  });

  it('refuses an output reached through a symbolic or hard link', async () => {
    const input = join(dir, 'spec.yaml');
    await writeFile(input, 'spec_version: 1\n');
    await symlink(input, join(dir, 'soft.yaml'));
    await link(input, join(dir, 'hard.yaml'));
    await symlink(dir, join(dir, 'linked-dir'));
    expect(() => ensureNotSame(input, join(dir, 'soft.yaml'))).toThrow(/refusing to write/);
    expect(() => ensureNotSame(input, join(dir, 'hard.yaml'))).toThrow(/refusing to write/);
    expect(() => ensureNotSame(input, join(dir, 'linked-dir', 'spec.yaml'))).toThrow(/refusing to write/);
  });

  it('allows a different file, existing or not', async () => {
    const input = join(dir, 'spec.yaml');
    await writeFile(input, 'spec_version: 1\n');
    await writeFile(join(dir, 'old-report.md'), 'x');
    expect(() => ensureNotSame(input, join(dir, 'old-report.md'))).not.toThrow();
    expect(() => ensureNotSame(input, join(dir, 'spec.xlsx'))).not.toThrow();
    expect(() => ensureNotSame(input, join(dir, 'missing', 'deeper', 'spec.yaml'))).not.toThrow();
  });
});
