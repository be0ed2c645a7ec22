import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { BATCH_WORK_LIMIT } from '../../src/core/review/batch-work-limit.ts';
import type { Locator } from '../../src/core/input/read-spec-result.ts';
import type { ReviewRow } from '../../src/core/review/review-row.ts';
import { OutputIsInputError } from '../../src/node/atomic-write.ts';
import { defaultRulesDir } from '../../src/node/load-rules-data.ts';
import { startProgress } from '../../src/node/progress.ts';
import { expandInputs } from '../../src/node/review/expand-inputs.ts';
import { runReview } from '../../src/node/review/run-review.ts';
import type { Console } from '../console.ts';
import { EXIT, exitOfVerdict, worstExit, type ExitCode } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { loadData } from '../load-data.ts';
import { reviewSummary } from '../review-summary.ts';

export interface BatchOptions {
  out?: string;
  json: boolean;
  decisive: boolean;
  teach: boolean;
  pdf: boolean;
  /** Proposals checked at once; the number of cores by default. */
  jobs?: number;
}

export const defaultJobs = () => availableParallelism();

/** A row's exit code: its verdict's, 2 for a file refused, 3 for a fault of the tool. */
function exitOfRow(r: ReviewRow): ExitCode {
  if (r.status === 'refused') return EXIT.badInput;
  if (r.status === 'fault' || r.verdict === null) return EXIT.fault;
  return exitOfVerdict(r.verdict);
}

/** A file's problems as one line: the first, located, and how many more. */
function refusal(file: string, issues: Parameters<typeof formatIssues>[1], locate?: Locator): string {
  // formatIssues' first line says the file cannot be checked (the table's row says so); its second is the first problem.
  const first = formatIssues(file, issues, locate).split('\n')[1].trim();
  return issues.length > 1 ? `${first} (and ${issues.length - 1} more)` : first;
}

/** `axletree check a.yaml b.yaml folder/ ...`: each proposal's outputs, and one review table of them all. */
export async function checkBatch(args: string[], opts: BatchOptions, con: Console): Promise<number> {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const given = await expandInputs(args, con.cwd);
  const out = resolve(con.cwd, opts.out ?? join('axletree-out', 'review'));
  // From here the first Ctrl-C stops after the proposals in hand, and their table is written.
  con.keepPartial?.();
  const progress = startProgress({ label: 'checking proposals', total: given.length, err: (s) => con.err(s), terminal: con.errIsTerminal === true, json: opts.json });
  let run;
  try {
    run = await runReview(given, {
      out,
      jobs: opts.jobs ?? defaultJobs(),
      data,
      rulesDir: con.rulesDir ?? defaultRulesDir(),
      workLimit: opts.decisive ? BATCH_WORK_LIMIT : null,
      teach: opts.teach,
      pdf: opts.pdf,
      stop: con.stop,
      progress,
      refusal,
    });
  } catch (e) {
    if (e instanceof OutputIsInputError) {
      con.err(`axletree: ${e.message}; choose another --out directory.\n`);
      return EXIT.badInput;
    }
    throw e;
  }
  const { table, written, notes } = run;
  for (const n of notes) con.err(`axletree: ${n}\n`);
  if (opts.json) {
    con.out(`${JSON.stringify({ ...table, written }, null, 2)}\n`);
    con.err(reviewSummary(table, written));
  } else con.out(reviewSummary(table, written));
  return worstExit(table.rows.map(exitOfRow));
}
