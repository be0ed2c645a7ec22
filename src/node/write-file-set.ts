import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { ensureNotSame, writeFileAtomic } from './atomic-write.ts';

/**
 * Write rendered files into a directory, each atomically, after checking that
 * none of them is the input; returns the paths written. Render everything
 * before calling, so a rendering error writes nothing.
 */
export async function writeFileSet(dir: string, files: readonly (readonly [string, string | Uint8Array])[], inputPath: string): Promise<string[]> {
  const paths = files.map(([name]) => join(dir, name));
  for (const p of paths) ensureNotSame(inputPath, p);
  await mkdir(dir, { recursive: true });
  for (const [i, [, data]] of files.entries()) await writeFileAtomic(paths[i], data);
  return paths;
}
