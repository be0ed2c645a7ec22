import { readSpec } from '../src/node/read-spec.ts';
import type { ReadSpec } from '../src/core/input/read-spec-result.ts';
import type { RulesData } from '../src/core/data/rules-data.ts';
import { prepareSpec, type Prepared } from '../src/core/spec/prepare.ts';
import type { Console } from './console.ts';
import { formatIssues } from './format-issues.ts';

/** A specification file read and prepared; on a problem, the issues are printed and null returned. */
export async function readPreparedSpec(file: string, input: string, data: RulesData, con: Console): Promise<{ read: Extract<ReadSpec, { ok: true }>; prepared: Extract<Prepared, { ok: true }> } | null> {
  const read = await readSpec(input);
  if (!read.ok) {
    con.err(formatIssues(file, read.issues));
    return null;
  }
  const prepared = prepareSpec(read.raw, data);
  if (!prepared.ok) {
    con.err(formatIssues(file, prepared.issues, read.locate));
    return null;
  }
  return { read, prepared };
}
