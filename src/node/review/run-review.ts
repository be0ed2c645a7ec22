import { join } from 'node:path';
import type { RulesData } from '../../core/data/rules-data.ts';
import type { Locator, Located } from '../../core/input/read-spec-result.ts';
import { uncheckedRow, type ReviewRow } from '../../core/review/review-row.ts';
import { reviewTable, type ReviewTable } from '../../core/review/review-table.ts';
import type { InputIssue } from '../../core/spec/input-issue.ts';
import { prepareSpec } from '../../core/spec/prepare.ts';
import { REVIEW_FILES, reviewFiles } from '../../render/review/review-files.ts';
import { ensureNotSame } from '../atomic-write.ts';
import type { Progress } from '../progress.ts';
import { readSpec } from '../read-spec.ts';
import { MANIFEST, writeFileSet } from '../write-file-set.ts';
import { startCheckThread, type CheckThread } from './check-thread.ts';
import { proposalNames, type GivenProposal } from './expand-inputs.ts';
import type { ProposalSettings } from './proposal-job.ts';

// A batch review: every proposal checked on its own thread (up to `jobs` at a
// time) with its full outputs in <out>/<name>/, then one review table of them
// all written as one set. The files are read and validated here, so a file
// that cannot be checked costs no thread and becomes a row with its error.
// Ctrl-C (`stop`) lets the proposals in hand finish, then the table of those
// finished is written: a complete, smaller set.

export interface ReviewOptions extends ProposalSettings {
  /** The review's folder (absolute). */
  out: string;
  /** Proposals checked at once, each on a thread of its own. */
  jobs: number;
  data: RulesData;
  stop?: AbortSignal;
  progress: Progress;
  /** A file's first problem, located, on one line (the command line's wording). */
  refusal(file: string, issues: (InputIssue & { at?: Located })[], locate?: Locator): string;
}

export interface ReviewRun {
  table: ReviewTable;
  /** The review's files and its manifest. */
  written: string[];
  /** Said once for the batch (e.g. why no PDF was printed). */
  notes: string[];
}

const firstLine = (text: string) => text.split('\n')[0];

export async function runReview(given: readonly GivenProposal[], o: ReviewOptions): Promise<ReviewRun> {
  // Refused before any work: a review file that would overwrite a proposal.
  for (const g of given) for (const f of [...Object.values(REVIEW_FILES), MANIFEST]) ensureNotSame(g.input, join(o.out, f));
  const names = proposalNames(given.map((g) => g.input));
  const rows: (ReviewRow | undefined)[] = given.map(() => undefined);
  const notes = new Set<string>();
  let cursor = 0;
  let done = 0;
  // The next proposal to start, or none once all are taken or Ctrl-C came.
  const take = () => (o.stop?.aborted || cursor >= given.length ? undefined : cursor++);

  const one = async (i: number, thread: () => CheckThread): Promise<ReviewRow> => {
    const g = given[i];
    const refused = (why: string) => uncheckedRow(g.file, names[i], 'refused', why);
    if (g.refused) return refused(g.refused);
    const read = await readSpec(g.input);
    if (!read.ok) return refused(o.refusal(g.file, read.issues));
    const prepared = prepareSpec(read.raw, o.data);
    if (!prepared.ok) return refused(o.refusal(g.file, prepared.issues, read.locate));
    try {
      const d = await thread().check({ file: g.file, input: g.input, name: names[i], dir: join(o.out, names[i]), raw: read.raw });
      if (d.note) notes.add(d.note);
      return d.row;
    } catch (e) {
      return uncheckedRow(g.file, names[i], 'fault', firstLine(e instanceof Error ? e.message : String(e)));
    }
  };

  const settings: ProposalSettings = { rulesDir: o.rulesDir, workLimit: o.workLimit, teach: o.teach, pdf: o.pdf };
  const lane = async () => {
    // Started at the first proposal that needs it, and again after one died.
    let thread: CheckThread | undefined;
    const current = () => (thread && !thread.dead ? thread : (thread = startCheckThread(settings)));
    try {
      for (let i = take(); i !== undefined; i = take()) {
        rows[i] = await one(i, current);
        o.progress.step(++done);
      }
    } finally {
      await thread?.close();
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, Math.min(o.jobs, given.length)) }, lane));

  const table = reviewTable({
    given: given.length,
    rows: rows.filter((r): r is ReviewRow => r !== undefined),
    notChecked: given.filter((_, i) => rows[i] === undefined).map((g) => g.file),
    decisiveWorkLimit: o.workLimit,
  });
  o.progress.finish(done, table.stopped);
  const written = await writeFileSet(o.out, await reviewFiles(table), given[0]?.input ?? o.out);
  return { table, written, notes: [...notes] };
}
