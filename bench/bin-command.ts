// The command as a user runs it: `axletree` (npx or an installed bin) starts
// Node through the bin's first line, with the Node options written there.
// The whole-process benches run it the same way, so what they measure is
// what a user gets, with the flags kept in one place (bin/axletree.mjs).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'axletree.mjs');

/** The Node options on a script's first line: `#!/usr/bin/env -S node <options>` or `#!/usr/bin/env node`. */
export function shebangNodeOptions(firstLine: string): string[] {
  const m = /^#!\s*\/usr\/bin\/env\s+(?:-S\s+)?node((?:\s+\S+)*)\s*$/.exec(firstLine);
  if (!m) throw new Error(`not a line that starts node through env: ${firstLine}`);
  return m[1].split(/\s+/).filter(Boolean);
}

/** The arguments after `node` that run the bin as its first line does: its Node options, then the bin. */
export function binArgs(): string[] {
  return [...shebangNodeOptions(readFileSync(BIN, 'utf8').split('\n', 1)[0]), BIN];
}
