// Runs the command line in-process or as the real binary, and locates text
// in a spec the test wrote, so expected line and column come from that text.
import { spawnSync } from 'node:child_process';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { run } from '../../cli/run.ts';

export const REPO = fileURLToPath(new URL('../..', import.meta.url));

export interface CliRun {
  code: number;
  out: string;
  err: string;
}

/** `axletree <argv>` through cli/run.ts with cwd set, capturing both streams. */
export async function runCli(argv: string[], cwd: string): Promise<CliRun> {
  let out = '';
  let err = '';
  const code = await run(argv, { out: (s) => (out += s), err: (s) => (err += s), cwd });
  return { code, out, err };
}

/** `node bin/axletree.mjs <argv>` as a child process, as a user would run it. */
export function runBinary(argv: string[], cwd: string): CliRun {
  const child = spawnSync(process.execPath, [join(REPO, 'bin', 'axletree.mjs'), ...argv], { cwd, encoding: 'utf8', timeout: 60_000 });
  if (child.error) throw child.error;
  return { code: child.status ?? -1, out: child.stdout, err: child.stderr };
}

export function freshDir(prefix = 'axletree-bad-input-'): Promise<string> {
  return mkdtemp(join(tmpdir(), prefix));
}

/** Replace text that must occur exactly once (so an edit cannot silently miss or hit twice). */
export function replaceOnce(text: string, find: string, replace: string): string {
  const at = uniqueIndex(text, find);
  return text.slice(0, at) + replace + text.slice(at + find.length);
}

/**
 * 1-based line and column of `token` inside the one occurrence of `context`
 * in `text`: `positionOf(t, 'spokes: six', 'six')`.
 */
export function positionOf(text: string, context: string, token = context): { line: number; column: number } {
  const inContext = context.indexOf(token);
  if (inContext < 0) throw new Error(`"${token}" is not inside "${context}"`);
  const offset = uniqueIndex(text, context) + inContext;
  const before = text.slice(0, offset).split('\n');
  return { line: before.length, column: before[before.length - 1].length + 1 };
}

function uniqueIndex(text: string, find: string): number {
  const at = text.indexOf(find);
  if (at < 0) throw new Error(`"${find}" is not in the text`);
  if (text.indexOf(find, at + 1) >= 0) throw new Error(`"${find}" occurs more than once in the text`);
  return at;
}
