import { open, realpath, rename, stat, unlink } from 'node:fs/promises';
import { realpathSync, statSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * Write a file so that it holds either its old content or the new one, never a
 * part: write a temporary file in the same directory (same file system, so the
 * rename is atomic), flush it to disk, then rename it over the target.
 */
export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const staged = await stageFile(path, data);
  await staged.commit();
}

/** A file written under a temporary name beside its target, flushed, waiting to be renamed into place (or dropped). */
export interface StagedFile {
  commit(): Promise<void>;
  drop(): Promise<void>;
}

export async function stageFile(path: string, data: string | Uint8Array): Promise<StagedFile> {
  const target = await followLink(resolve(path));
  const dir = dirname(target);
  const temp = join(dir, `.${basename(target)}.${randomBytes(6).toString('hex')}.tmp`);
  const previousMode = await stat(target).then((s) => s.mode & 0o7777, () => undefined);

  let handle: Awaited<ReturnType<typeof open>> | undefined;
  try {
    handle = await open(temp, 'wx'); // wx: never reuse a file someone else made
    await handle.writeFile(data);
    if (previousMode !== undefined) await handle.chmod(previousMode);
    await handle.sync();
    await handle.close();
    handle = undefined;
  } catch (error) {
    await handle?.close().catch(() => undefined);
    await unlink(temp).catch(() => undefined);
    throw error;
  }
  const drop = () => unlink(temp).catch(() => undefined);
  return {
    async commit() {
      try {
        await rename(temp, target);
      } catch (error) {
        await drop();
        throw error;
      }
      await syncDirectory(dir);
    },
    drop,
  };
}

/** Write through a symbolic link to the file it names, keeping the link. */
async function followLink(target: string): Promise<string> {
  try {
    return await realpath(target);
  } catch (error) {
    if (isCode(error, 'ENOENT')) return target;
    throw error;
  }
}

/** Make the rename itself durable; some systems cannot open a directory, which is harmless. */
async function syncDirectory(dir: string): Promise<void> {
  const handle = await open(dir, 'r').catch(() => undefined);
  if (!handle) return;
  try {
    await handle.sync();
  } catch {
    // Directory fsync is unsupported on some file systems; the data file is already synced.
  } finally {
    await handle.close();
  }
}

export class OutputIsInputError extends Error {
  constructor(inputPath: string, outputPath: string) {
    super(`refusing to write ${outputPath}: it is the input file ${inputPath}`);
    this.name = 'OutputIsInputError';
  }
}

/**
 * Throw if writing outputPath would overwrite inputPath: the same real path
 * after links and "..", or the same file under another name (a hard link).
 * Synchronous so that a caller cannot forget to wait for it before writing.
 */
export function ensureNotSame(inputPath: string, outputPath: string): void {
  if (realPathOf(inputPath) === realPathOf(outputPath) || sameFile(inputPath, outputPath)) {
    throw new OutputIsInputError(inputPath, outputPath);
  }
}

/** The real path, for a file that may not exist yet: its nearest existing ancestor's real path plus the rest. */
function realPathOf(path: string): string {
  const absolute = resolve(path);
  try {
    return realpathSync.native(absolute);
  } catch (error) {
    if (!isCode(error, 'ENOENT') && !isCode(error, 'ENOTDIR')) throw error;
    const parent = dirname(absolute);
    if (parent === absolute) return absolute;
    return join(realPathOf(parent), basename(absolute));
  }
}

function sameFile(a: string, b: string): boolean {
  const sa = statOrNone(a);
  const sb = statOrNone(b);
  return sa !== undefined && sb !== undefined && sa.dev === sb.dev && sa.ino === sb.ino;
}

/** A path's status, or undefined where nothing can be there (missing, or under a file). */
function statOrNone(path: string) {
  try {
    return statSync(path, { throwIfNoEntry: false });
  } catch (error) {
    if (isCode(error, 'ENOTDIR')) return undefined;
    throw error;
  }
}

function isCode(error: unknown, code: string): boolean {
  return typeof error === 'object' && error !== null && (error as { code?: unknown }).code === code;
}
