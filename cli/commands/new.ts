import { existsSync } from 'node:fs';
import { extname, resolve } from 'node:path';
import { ensureNotSame, OutputIsInputError, writeFileAtomic } from '../../src/node/atomic-write.ts';
import { asOutputError } from '../../src/node/output-error.ts';
import { readSpec } from '../../src/node/read-spec.ts';
import { choicesOf } from '../../src/render/spec-workbook/choice-lists.ts';
import { specificationWorkbookBytes, unplacedKeys } from '../../src/render/spec-workbook/spec-sheets.ts';
import { specYaml } from '../../src/render/spec-yaml-template.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { loadData } from '../load-data.ts';

export interface NewOptions {
  /** A specification whose values fill the new file. */
  from?: string;
  /** Replace an existing file. */
  force: boolean;
}

// A Map: the extension is the user's, and must not find an object's inherited keys.
const KINDS = new Map<string, 'workbook' | 'yaml'>([['.xlsx', 'workbook'], ['.yaml', 'yaml'], ['.yml', 'yaml']]);

/** `axletree new <file.xlsx|file.yaml>`: a fill-in specification, blank or from a spec. */
export async function newCommand(file: string, opts: NewOptions, con: Console): Promise<number> {
  const kind = KINDS.get(extname(file).toLowerCase());
  if (!kind) {
    con.err(`axletree new: ${file}: give a name ending in .xlsx (a workbook) or .yaml (a commented YAML file).\n`);
    return EXIT.badInput;
  }
  const target = resolve(con.cwd, file);
  if (existsSync(target) && !opts.force) {
    con.err(`axletree new: ${file} already exists; nothing was written. Give another name, or --force to replace it.\n`);
    return EXIT.badInput;
  }
  let raw: unknown;
  if (opts.from !== undefined) {
    const from = resolve(con.cwd, opts.from);
    try {
      ensureNotSame(from, target);
    } catch (e) {
      if (!(e instanceof OutputIsInputError)) throw e;
      con.err(`axletree new: ${file} is the specification it would be made from; nothing was written. Give another name.\n`);
      return EXIT.badInput;
    }
    const read = await readSpec(from);
    if (!read.ok) {
      con.err(formatIssues(opts.from, read.issues));
      return EXIT.badInput;
    }
    const lost = unplacedKeys(read.raw);
    if (lost.length) {
      con.err(`axletree new: ${opts.from} has keys that are not part of a specification, which the new file could not hold: ${lost.join(', ')}; nothing was written. Remove or correct them first.\n`);
      return EXIT.badInput;
    }
    raw = read.raw;
  }
  let bytes: string | Uint8Array;
  if (kind === 'yaml') {
    bytes = specYaml(raw);
  } else {
    const data = loadData(con);
    if (!data) return EXIT.badInput;
    bytes = await specificationWorkbookBytes(raw, choicesOf(data));
  }
  await writeFileAtomic(target, bytes).catch((e: unknown) => {
    throw asOutputError(e, target);
  });
  con.out(`axletree: wrote ${file}${opts.from ? ` with the values of ${opts.from}` : ''}. Fill it in, then run: npx axletree check ${file}\n`);
  return EXIT.ok;
}
