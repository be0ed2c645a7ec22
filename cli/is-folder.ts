import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';

/** True where the path names a folder (a batch of the specifications in it). */
export async function isFolder(cwd: string, path: string): Promise<boolean> {
  return stat(resolve(cwd, path)).then(
    (s) => s.isDirectory(),
    () => false,
  );
}
