// Reads an input file whole, but only a regular file and only up to a cap:
// a named pipe would block the command until something wrote to it, a
// device (/dev/zero) would never end, and a huge file would be read into
// memory before any check could refuse it.
import { constants } from 'node:fs';
import { open, stat, type FileHandle } from 'node:fs/promises';
import type { MessageKey } from '../core/diagnostics/messages.ts';
import { bytesText } from '../core/input/input-limits.ts';

export type Capped = { ok: true; bytes: Buffer } | { ok: false; key: MessageKey; params: Record<string, string> };

/** Whether a path exists and is a directory, without opening it (opening a pipe could block). */
export async function pathKind(path: string): Promise<'missing' | 'directory' | 'other'> {
  const info = await stat(path).catch(() => undefined);
  return !info ? 'missing' : info.isDirectory() ? 'directory' : 'other';
}

/**
 * The bytes of the file at path, if it is a regular file of at most `max`
 * bytes; `what` names the file in the size message ("a YAML or JSON file").
 */
export async function readCapped(path: string, max: number, what: string): Promise<Capped> {
  let handle: FileHandle;
  try {
    // Non-blocking, so that opening a pipe with no writer returns at once; a regular file reads as usual.
    handle = await open(path, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  } catch (e) {
    const code = (e as { code?: string }).code;
    if (code === 'ENOENT') return { ok: false, key: 'fileMissing', params: { path } };
    return { ok: false, key: 'fileUnreadable', params: { path, reason: (e as Error).message } };
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) return { ok: false, key: 'fileIsDirectory', params: { path } };
    if (!info.isFile()) return { ok: false, key: 'fileNotRegular', params: { path, kind: kindOf(info) } };
    const tooBig = (size: string): Capped => ({ ok: false, key: 'fileTooBig', params: { path, size, what, max: bytesText(max) } });
    if (info.size > max) return tooBig(bytesText(info.size));
    // The file may have grown since: read until its end, refusing it the moment it passes the cap.
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const chunk = Buffer.alloc(Math.min(Math.max(info.size - total, 65_536), max - total) + 1);
      const { bytesRead } = await handle.read(chunk, 0, chunk.length, total);
      if (bytesRead === 0) break;
      chunks.push(chunk.subarray(0, bytesRead));
      total += bytesRead;
      if (total > max) return tooBig(`more than ${bytesText(max)}`);
    }
    return { ok: true, bytes: Buffer.concat(chunks, total) };
  } catch (e) {
    return { ok: false, key: 'fileUnreadable', params: { path, reason: (e as Error).message } };
  } finally {
    await handle.close();
  }
}

function kindOf(info: { isFIFO(): boolean; isSocket(): boolean; isCharacterDevice(): boolean; isBlockDevice(): boolean }): string {
  if (info.isFIFO()) return 'a named pipe';
  if (info.isSocket()) return 'a socket';
  if (info.isCharacterDevice()) return 'a character device';
  if (info.isBlockDevice()) return 'a block device';
  return 'something other than a file';
}
