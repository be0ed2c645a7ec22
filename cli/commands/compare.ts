import { basename, extname, join, resolve } from 'node:path';
import { compareBuilds } from '../../src/core/compare/compare-builds.ts';
import type { CompareResult } from '../../src/core/compare/compare-result.ts';
import { SHORT_CAUTION } from '../../src/core/cautions.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { startProgress } from '../../src/node/progress.ts';
import { compareJson, writeCompare } from '../../src/node/write-compare.ts';
import type { Console } from '../console.ts';
import { EXIT, exitOfVerdict, worstExit } from '../exit-codes.ts';
import { loadData } from '../load-data.ts';
import { readPreparedSpec } from '../read-prepared-spec.ts';
import { writeOrRefuse } from '../write-or-refuse.ts';

export interface CompareOptions {
  out?: string;
  json: boolean;
  /** Search each build for its decisive inputs, as check does. */
  decisive: boolean;
}

const stem = (file: string) => basename(file, extname(file));

/** The terminal summary: each build's verdict, why they differ, where the files went. */
function compareSummary(c: CompareResult, written: readonly string[]): string {
  return [
    ...c.builds.map((b, i) => `${b.label}${i === 0 ? ' (baseline)' : ''}: ${b.spec_name}: ${b.verdict.toUpperCase()}`),
    ...c.accounts.map((a) => a.text),
    'written:',
    ...written.map((w) => `  ${w}`),
    SHORT_CAUTION,
  ].join('\n') + '\n';
}

export async function compareCommand(files: readonly string[], opts: CompareOptions, con: Console): Promise<number> {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  // Every file read and prepared before any check runs: a refused one stops the run with nothing written.
  const inputs = files.map((f) => resolve(con.cwd, f));
  const specs = [];
  for (const [i, file] of files.entries()) {
    const got = await readPreparedSpec(file, inputs[i], data, con);
    if (!got) return EXIT.badInput;
    specs.push(got);
  }
  const lp = await loadLpSolver();
  const progress = startProgress({ label: 'compare', total: 2 * files.length - 1, err: (t) => con.err(t), terminal: con.errIsTerminal ?? false, json: opts.json });
  const builds = specs.map(({ read, prepared }, i) => {
    const result = runCheck(prepared.spec, prepared.entries, data, { lp, decisive: opts.decisive });
    result.input = read.raw;
    progress.step(i + 1);
    return { label: String.fromCharCode(65 + i), file: files[i], spec: prepared.spec, result };
  });
  const c = compareBuilds({ builds, data, inputs: { lp, ride: true }, rules: RULES, onAccount: (n) => progress.step(files.length + n) });
  progress.finish(2 * files.length - 1);
  const dir = resolve(con.cwd, opts.out ?? join('axletree-out', `compare-${files.map(stem).join('-')}`));
  const written = await writeOrRefuse(() => writeCompare(c, builds.map((b) => b.result), dir, inputs), con);
  if (!written) return EXIT.badInput;
  if (opts.json) {
    con.out(compareJson(c));
    con.err(compareSummary(c, written));
  } else con.out(compareSummary(c, written));
  return worstExit(builds.map((b) => exitOfVerdict(b.result.verdict)));
}
