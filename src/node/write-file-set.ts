import { createHash } from 'node:crypto';
import { mkdir, readdir, readFile, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { ensureNotSame, stageFile, writeFileAtomic, type StagedFile } from './atomic-write.ts';
import { critical } from './critical-section.ts';
import { asOutputError } from './output-error.ts';

/** The set's manifest: written last, so a set is complete exactly when its manifest matches its files. */
export const MANIFEST = 'manifest.json';

interface Manifest {
  tool: string;
  files: { name: string; bytes: number; sha256: string }[];
}

/**
 * Write rendered files into a directory as one set: after checking that none
 * of them is the input, clear temporary files an interrupted run left, write
 * every file under a temporary name, then rename them all into place, write
 * the manifest (names, sizes, hashes) and remove the files of the previous set
 * that this one no longer has, without letting Ctrl-C stop that last step half
 * done. A run stopped before it leaves the previous set whole; a reader trusts
 * a set only when its manifest matches. Other commands' files in the folder
 * (and sub-folders) are left alone. Render everything before calling, so a
 * rendering error writes nothing. Returns the paths written.
 */
export async function writeFileSet(dir: string, files: readonly (readonly [string, string | Uint8Array])[], inputPath: string): Promise<string[]> {
  const paths = files.map(([name]) => join(dir, name));
  for (const p of [...paths, join(dir, MANIFEST)]) ensureNotSame(inputPath, p);
  try {
    await mkdir(dir, { recursive: true });
    await clearTemporaries(dir);
    const before = await readManifest(dir);
    // Every file first under a temporary name: stopped here, the previous set stands untouched.
    const staged: StagedFile[] = [];
    try {
      for (const [i, [, data]] of files.entries()) staged.push(await stageFile(paths[i], data));
    } catch (e) {
      for (const s of staged) await s.drop();
      throw e;
    }
    const manifest: Manifest = {
      tool: 'axletree',
      files: files.map(([name, data]) => ({ name, bytes: Buffer.byteLength(data), sha256: createHash('sha256').update(data).digest('hex') })),
    };
    // Then the renames, the manifest and the removal of stale files, which Ctrl-C does not cut short.
    await critical(async () => {
      for (const s of staged) await s.commit();
      await writeFileAtomic(join(dir, MANIFEST), JSON.stringify(manifest, null, 2) + '\n');
      const kept = new Set(files.map(([name]) => name));
      for (const old of before?.files ?? []) if (!kept.has(old.name) && !old.name.includes('/')) await unlink(join(dir, old.name)).catch(() => undefined);
    });
  } catch (e) {
    throw asOutputError(e, dir);
  }
  return [...paths, join(dir, MANIFEST)];
}

/** True when the folder's manifest lists exactly what its files hold (sizes and hashes). */
export async function setIsComplete(dir: string): Promise<boolean> {
  const m = await readManifest(dir);
  if (!m) return false;
  for (const f of m.files) {
    const data = await readFile(join(dir, f.name)).catch(() => null);
    if (!data || data.length !== f.bytes || createHash('sha256').update(data).digest('hex') !== f.sha256) return false;
  }
  return true;
}

async function readManifest(dir: string): Promise<Manifest | null> {
  try {
    const m = JSON.parse(await readFile(join(dir, MANIFEST), 'utf8')) as Manifest;
    return Array.isArray(m.files) ? m : null;
  } catch {
    return null;
  }
}

/** Temporary files of an interrupted atomic write (`.<name>.<hex>.tmp`), ours only. */
async function clearTemporaries(dir: string): Promise<void> {
  for (const name of await readdir(dir)) if (/^\..+\.[0-9a-f]{12}\.tmp$/.test(name)) await unlink(join(dir, name)).catch(() => undefined);
}
