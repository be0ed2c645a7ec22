import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { isDeepStrictEqual } from 'node:util';
import type { PointOutcome } from '../../core/sweep/point-outcome.ts';
import type { SweepDefinition } from '../../core/sweep/sweep-result.ts';
import { setIsComplete, writeFileSet } from '../write-file-set.ts';

// A shard's share of a sweep (`--shard i/n`), written as a set of its own,
// and the joining of every shard's share (`--merge`). A share carries the
// sweep's whole definition and the spec as read, so the merge needs nothing
// else: it checks the shares are of one sweep and cover it once, then makes
// the sweep's outputs exactly as a run in one piece does.

export const PART_FILE = 'sweep-part.json';

export interface SweepPart {
  axletree_sweep_part: 1;
  caution: string;
  definition: SweepDefinition;
  /** The spec as read (the points change it), and how each point is checked. */
  setup: { raw: unknown; ride: boolean; figures: string[] };
  /** The rules data the points were checked against: shares checked against different data do not join. */
  rules_fingerprint: string;
  shard: { index: number; of: number; start: number; end: number };
  /** False where the shard was stopped before its last point. */
  finished: boolean;
  outcomes: PointOutcome[];
}

export async function writePart(dir: string, part: SweepPart, inputPath: string): Promise<string[]> {
  return writeFileSet(dir, [[PART_FILE, `${JSON.stringify(part)}\n`]], inputPath);
}

export type Joined = { ok: true; first: SweepPart; outcomes: PointOutcome[] } | { ok: false; message: string };

/** The shares in the folders joined into the whole sweep's points, or what keeps them from joining. */
export async function joinParts(dirs: readonly string[], shown: readonly string[]): Promise<Joined> {
  const parts: SweepPart[] = [];
  for (const [i, dir] of dirs.entries()) {
    const file = join(dir, PART_FILE);
    const text = await readFile(file, 'utf8').catch(() => null);
    if (text === null) return { ok: false, message: `${shown[i]}: no ${PART_FILE} here; give the folders \`sweep --shard\` wrote` };
    if (!(await setIsComplete(dir))) return { ok: false, message: `${shown[i]}: the files do not match their manifest (a run stopped while writing, or a file changed since); run that shard again` };
    let part: SweepPart;
    try {
      part = JSON.parse(text) as SweepPart;
    } catch {
      return { ok: false, message: `${shown[i]}: ${PART_FILE} is not JSON` };
    }
    if (part.axletree_sweep_part !== 1) return { ok: false, message: `${shown[i]}: ${PART_FILE} is not a shard of a sweep this version writes` };
    parts.push(part);
  }
  const first = parts[0];
  const of = first.shard.of;
  for (const [i, p] of parts.entries()) {
    if (!isDeepStrictEqual(p.definition, first.definition) || !isDeepStrictEqual(p.setup, first.setup)) return { ok: false, message: `${shown[i]} is a shard of another sweep than ${shown[0]} (the spec, the varied values or the options differ)` };
    if (p.rules_fingerprint !== first.rules_fingerprint) return { ok: false, message: `${shown[i]} was checked against other rules data than ${shown[0]}; run the shards again with the same data` };
    if (p.shard.of !== of) return { ok: false, message: `${shown[i]} is shard ${p.shard.index}/${p.shard.of}, ${shown[0]} is one of ${of}; give the shards of one split` };
    if (!p.finished) return { ok: false, message: `${shown[i]}: shard ${p.shard.index}/${of} was stopped after ${p.outcomes.length} of its ${p.shard.end - p.shard.start} points; run it again` };
  }
  const seen = new Map<number, string>();
  for (const [i, p] of parts.entries()) {
    if (seen.has(p.shard.index)) return { ok: false, message: `shard ${p.shard.index}/${of} is given twice: ${seen.get(p.shard.index)} and ${shown[i]}` };
    seen.set(p.shard.index, shown[i]);
  }
  const missing = Array.from({ length: of }, (_, k) => k + 1).filter((k) => !seen.has(k));
  if (missing.length) return { ok: false, message: `shard(s) ${missing.map((k) => `${k}/${of}`).join(', ')} missing; give the folders of all ${of}` };
  const outcomes = parts.flatMap((p) => p.outcomes).sort((a, b) => a.index - b.index);
  if (outcomes.length !== first.definition.total || outcomes.some((o, k) => o.index !== k)) return { ok: false, message: `the shards do not cover the sweep's ${first.definition.total} points once each` };
  return { ok: true, first, outcomes };
}
