import { readdir, stat } from 'node:fs/promises';
import { basename, extname, join, resolve } from 'node:path';

// The proposals of a batch from what was given: each file as it stands, each
// folder as the specifications directly in it (.yaml, .yml, .json, .xlsx; not
// its sub-folders, where earlier outputs live), in name order. The same file
// given twice is one proposal. A folder without a specification is a
// proposal that cannot be checked, so it is not silently dropped.

export const SPEC_EXTENSIONS = ['.yaml', '.yml', '.json', '.xlsx'] as const;

export interface GivenProposal {
  /** As the user would name it: the argument, or the folder argument joined with the file's name. */
  file: string;
  /** Absolute. */
  input: string;
  /** Why it cannot be a proposal, where that is known before reading it (an empty folder). */
  refused?: string;
}

/** A specification by its name: our extensions, not hidden, not a spreadsheet's lock file. */
export function isSpecName(name: string): boolean {
  return (SPEC_EXTENSIONS as readonly string[]).includes(extname(name).toLowerCase()) && !name.startsWith('.') && !name.startsWith('~$');
}

/** The specifications directly in a folder, in name order; none where the path is not a folder. */
export async function specsIn(folder: string): Promise<string[]> {
  const entries = await readdir(folder, { withFileTypes: true }).catch(() => []);
  return entries
    .filter((e) => !e.isDirectory() && isSpecName(e.name))
    .map((e) => e.name)
    .sort();
}

export async function expandInputs(args: readonly string[], cwd: string): Promise<GivenProposal[]> {
  const out: GivenProposal[] = [];
  const seen = new Set<string>();
  const add = (p: GivenProposal) => {
    if (seen.has(p.input)) return;
    seen.add(p.input);
    out.push(p);
  };
  for (const arg of args) {
    const input = resolve(cwd, arg);
    const isFolder = await stat(input).then((s) => s.isDirectory(), () => false);
    if (!isFolder) {
      add({ file: arg, input });
      continue;
    }
    const specs = await specsIn(input);
    if (specs.length === 0) add({ file: arg, input, refused: `the folder holds no specification (${SPEC_EXTENSIONS.join(', ')}) directly in it` });
    for (const name of specs) add({ file: join(arg, name), input: join(input, name) });
  }
  return out;
}

/** Each proposal's folder name: its file's name without the extension, made unique (-2, -3, ...) where names meet, in any case. */
export function proposalNames(files: readonly string[]): string[] {
  const taken = new Set<string>();
  return files.map((f) => {
    const base = basename(f, extname(f)) || 'proposal';
    let name = base;
    for (let n = 2; taken.has(name.toLowerCase()); n++) name = `${base}-${n}`;
    taken.add(name.toLowerCase());
    return name;
  });
}
