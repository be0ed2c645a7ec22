// The bad-input catalogue's case files (tests/fixtures/bad/*.case.yaml): a
// command line run in a fresh folder holding the files the case lists, the
// exit code it must give and the first words of its message.
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { deepMerge } from './fixtures.ts';
import { REPO, replaceOnce } from './run-cli.ts';
import { GENERATORS } from './bad-generators.ts';

export interface BadFile {
  /** The file's text as it is. */
  text?: string;
  /** A spec from specs/ (a name without .yaml), changed by `patch` (merged as objects) and/or `replace` (text edits, each find occurring once). */
  from?: string;
  patch?: unknown;
  replace?: [string, string][];
  /** Written as JSON rather than YAML (with `from`). */
  json?: boolean;
  /** A named generator in tests/support/bad-generators.ts, for inputs too big or binary to keep as text. */
  generate?: string;
}

export interface BadCase {
  name: string;
  /** Why the case exists: what went wrong before. */
  what: string;
  argv: string[];
  files?: Record<string, BadFile>;
  /** Named steps before the run: `fifo:NAME` makes a named pipe, `readonly:DIR` a read-only folder, `dir:NAME` an empty folder. */
  setup?: string[];
  /** 0, 1 or 2: the exit code the run must give. */
  exit: 0 | 1 | 2;
  /** The first words of the message (the text after "axletree: " or the located message), found in standard error or output. */
  message?: string;
  /** Run as the real binary (a child process) rather than in-process: for cases about the process itself. */
  binary?: boolean;
  /** The case depends on file permissions, which do not bind the superuser: skipped, saying so, when run as root. */
  notAsRoot?: boolean;
}

export function readCase(file: string): BadCase {
  const c = parse(readFileSync(file, 'utf8')) as BadCase;
  if (!c.name || !c.what || !Array.isArray(c.argv) || ![0, 1, 2].includes(c.exit)) throw new Error(`${file}: a case needs name, what, argv and exit 0, 1 or 2`);
  return c;
}

/** Writes the case's files and runs its setup steps in dir. */
export async function prepareCase(c: BadCase, dir: string): Promise<void> {
  for (const [name, f] of Object.entries(c.files ?? {})) writeFileSync(join(dir, name), await contentOf(f));
  for (const step of c.setup ?? []) {
    const [kind, arg] = step.split(':');
    if (kind === 'fifo') execFileSync('mkfifo', [join(dir, arg)]);
    else if (kind === 'dir') mkdirSync(join(dir, arg), { recursive: true });
    else if (kind === 'readonly') {
      mkdirSync(join(dir, arg), { recursive: true });
      chmodSync(join(dir, arg), 0o555);
    } else throw new Error(`unknown setup step ${step}`);
  }
}

async function contentOf(f: BadFile): Promise<string | Uint8Array> {
  if (f.generate !== undefined) {
    const g = GENERATORS[f.generate];
    if (!g) throw new Error(`no generator ${f.generate}`);
    return g();
  }
  if (f.text !== undefined) return f.text;
  if (f.from === undefined) throw new Error('a file needs text, from or generate');
  const path = join(REPO, 'specs', `${f.from}.yaml`);
  if (!existsSync(path)) throw new Error(`no spec ${f.from}`);
  let text = readFileSync(path, 'utf8');
  for (const [find, repl] of f.replace ?? []) text = replaceOnce(text, find, repl);
  if (f.patch === undefined && !f.json) return text;
  const obj = deepMerge(parse(text) as unknown, f.patch ?? {});
  return f.json ? JSON.stringify(obj, null, 2) + '\n' : stringify(obj);
}
