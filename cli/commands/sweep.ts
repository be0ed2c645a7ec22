import { availableParallelism } from 'node:os';
import { basename, extname, join, resolve } from 'node:path';
import { readSpec } from '../../src/node/read-spec.ts';
import { OutputIsInputError } from '../../src/node/atomic-write.ts';
import { defaultRulesDir } from '../../src/node/load-rules-data.ts';
import { rulesFingerprint } from '../../src/node/rules-data-snapshot.ts';
import { startProgress } from '../../src/node/progress.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { parseVaries } from '../../src/core/sweep/sweep-axis.ts';
import { parseJobs, parseSamples, parseSeed, parseShard } from '../../src/core/sweep/sweep-options.ts';
import { checkSize, shardRange, sweepPoints, type SweepMode } from '../../src/core/sweep/sweep-points.ts';
import { valueAtKey } from '../../src/core/sweep/spec-diff.ts';
import type { SweepDefinition, SweepResult } from '../../src/core/sweep/sweep-result.ts';
import { startPool, type Pool } from '../../src/node/sweep/sweep-pool.ts';
import { checkPoints, finishSweep, type SessionHooks } from '../../src/node/sweep/sweep-session.ts';
import { joinParts, PART_FILE, writePart } from '../../src/node/sweep/sweep-parts.ts';
import { writeSweep } from '../../src/node/sweep/write-sweep.ts';
import { sweepJson } from '../../src/render/sweep/sweep-json.ts';
import { sweepSummary } from '../../src/render/sweep/sweep-summary.ts';
import type { SweepSetup } from '../../src/node/sweep/sweep-work.ts';
import { SHORT_CAUTION } from '../../src/core/cautions.ts';
import type { Console } from '../console.ts';
import { EXIT, worstExit } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { loadData } from '../load-data.ts';

export interface SweepOptions {
  vary: string[];
  samples?: string;
  seed: string;
  figure: string[];
  statics: boolean;
  jobs?: string;
  shard?: string;
  merge: boolean;
  out?: string;
  json: boolean;
}

/** The figure plotted when none is chosen: the load on each horse. */
export const DEFAULT_FIGURE = 'yoke_load_per_horse';

const refuse = (con: Console, message: string) => {
  con.err(`axletree sweep: ${message}\n`);
  return EXIT.badInput;
};

export async function sweepCommand(positionals: string[], opts: SweepOptions, con: Console): Promise<number> {
  const jobs = opts.jobs === undefined ? { ok: true as const, value: availableParallelism() } : parseJobs(opts.jobs, 256);
  if (!jobs.ok) return refuse(con, jobs.message);
  if (opts.merge) {
    const stray = [opts.vary.length > 0 && '--vary', opts.figure.length > 0 && '--figure', opts.samples !== undefined && '--samples', opts.shard !== undefined && '--shard', opts.statics && '--statics'].filter(Boolean);
    if (stray.length) return refuse(con, `--merge takes the shards' folders: the sweep's own options were given to the shards (drop ${stray.join(', ')})`);
    return mergeCommand(positionals, opts, jobs.value, con);
  }
  if (positionals.length !== 1) return refuse(con, `give exactly one specification file (got ${positionals.length}); several folders go with --merge`);
  const [file] = positionals;
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const input = resolve(con.cwd, file);
  const read = await readSpec(input);
  if (!read.ok) return (con.err(formatIssues(file, read.issues)), EXIT.badInput);
  const prepared = prepareSpec(read.raw, data);
  if (!prepared.ok) return (con.err(formatIssues(file, prepared.issues, read.locate)), EXIT.badInput);
  const axes = parseVaries(opts.vary, prepared.spec);
  if (!axes.ok) return refuse(con, axes.message);
  let mode: SweepMode = { kind: 'grid' };
  if (opts.samples !== undefined) {
    const samples = parseSamples(opts.samples);
    if (!samples.ok) return refuse(con, samples.message);
    const seed = parseSeed(opts.seed);
    if (!seed.ok) return refuse(con, seed.message);
    mode = { kind: 'samples', samples: samples.value, seed: seed.value };
  }
  const size = checkSize(axes.value, mode);
  if (!size.ok) return refuse(con, size.message);
  const shard = opts.shard === undefined ? undefined : parseShard(opts.shard);
  if (shard && !shard.ok) return refuse(con, shard.message);
  const design = axes.value.map((a) => valueAtKey(prepared.spec, a.steps) as number);
  const points = sweepPoints({ axes: axes.value, mode, design });
  const figures = opts.figure.length ? opts.figure : [DEFAULT_FIGURE];
  const rulesDir = con.rulesDir ?? defaultRulesDir();
  const setup: SweepSetup = { raw: read.raw, rulesDir, paths: axes.value.map((a) => a.steps), ride: !opts.statics, figures };
  const stem = basename(file, extname(file));
  const def: SweepDefinition = { spec_name: prepared.spec.name, spec_file: basename(file), statics: opts.statics, mode, axes: axes.value, design, figures: [], total: points.length };

  const pool = await startPool(setup, Math.min(jobs.value, points.length));
  if (!pool.ok) return refuse(con, `${file}: ${pool.reason}`);
  try {
    const unknown = figures.filter((f) => !Object.hasOwn(pool.ready.figureUnits, f));
    if (unknown.length) return refuse(con, `option --figure ${unknown.map((u) => `"${u}"`).join(', ')}: no such figure; figures: ${Object.keys(pool.ready.figureUnits).sort().join(', ')}`);
    def.figures = figures.map((name) => ({ name, unit: pool.ready.figureUnits[name] }));
    con.keepPartial?.();
    const hooks = sessionHooks(opts, con);
    if (shard?.ok) {
      const range = shardRange(points.length, shard.value.index, shard.value.of);
      const run = await checkPoints(pool.lanes, points.slice(range.start, range.end), hooks);
      const dir = resolve(con.cwd, opts.out ?? join('axletree-out', `sweep-${stem}-shard-${shard.value.index}-of-${shard.value.of}`));
      const part = { axletree_sweep_part: 1 as const, caution: SHORT_CAUTION, definition: def, setup: { raw: read.raw, ride: setup.ride, figures }, rules_fingerprint: rulesFingerprint(rulesDir), shard: { ...shard.value, ...range }, finished: !run.stopped, outcomes: run.outcomes };
      const written = await writeOr(con, () => writePart(dir, part, input));
      if (written === null) return EXIT.badInput;
      con.out(`sweep of ${def.spec_name}: shard ${shard.value.index}/${shard.value.of}, ${run.outcomes.length} of its ${range.end - range.start} points${run.stopped ? ' (stopped)' : ''}\nwrote ${dir}/ (join the shards with axletree sweep --merge)\n`);
      return worstExit(run.outcomes.map((o) => (o.verdict === 'error' ? EXIT.fault : EXIT.ok)));
    }
    const run = await checkPoints(pool.lanes, points, hooks);
    const { result } = await finishSweep(pool.lanes, def, run.outcomes, hooks);
    const dir = resolve(con.cwd, opts.out ?? join('axletree-out', `sweep-${stem}`));
    return await report(con, opts, result, dir, input);
  } finally {
    await pool.close();
  }
}

async function mergeCommand(dirs: string[], opts: SweepOptions, jobs: number, con: Console): Promise<number> {
  const joined = await joinParts(
    dirs.map((d) => resolve(con.cwd, d)),
    dirs,
  );
  if (!joined.ok) return refuse(con, `--merge: ${joined.message}`);
  // Written there, the whole sweep's set would replace a shard's share.
  if (opts.out !== undefined && dirs.some((d) => resolve(con.cwd, d) === resolve(con.cwd, opts.out!))) return refuse(con, `--merge: --out ${opts.out} is one of the shards' folders; choose another`);
  const { definition: def, setup } = joined.first;
  const rulesDir = con.rulesDir ?? defaultRulesDir();
  if (rulesFingerprint(rulesDir) !== joined.first.rules_fingerprint) return refuse(con, '--merge: the rules data has changed since the shards ran; run them again');
  // The envelope's edges are bisected here, on the whole check, as a sweep run in one piece does.
  let pool: Pool | undefined;
  try {
    pool = await startPool({ raw: setup.raw, rulesDir, paths: def.axes.map((a) => a.steps), ride: setup.ride, figures: setup.figures }, jobs);
    if (!pool.ok) return refuse(con, `--merge: the shards' spec is refused: ${pool.reason}`);
    con.keepPartial?.();
    const { result } = await finishSweep(pool.lanes, def, joined.outcomes, sessionHooks(opts, con));
    const dir = resolve(con.cwd, opts.out ?? join('axletree-out', `sweep-${basename(def.spec_file, extname(def.spec_file))}`));
    return await report(con, opts, result, dir, join(resolve(con.cwd, dirs[0]), PART_FILE));
  } finally {
    if (pool?.ok) await pool.close();
  }
}

function sessionHooks(opts: SweepOptions, con: Console): SessionHooks {
  return { stop: con.stop, progress: (label, total) => startProgress({ label, total, err: (t) => con.err(t), terminal: con.errIsTerminal ?? false, json: opts.json }) };
}

async function writeOr(con: Console, write: () => Promise<string[]>): Promise<string[] | null> {
  try {
    return await write();
  } catch (e) {
    if (e instanceof OutputIsInputError) {
      con.err(`axletree sweep: ${e.message}; choose another --out directory.\n`);
      return null;
    }
    throw e;
  }
}

async function report(con: Console, opts: SweepOptions, result: SweepResult, dir: string, input: string): Promise<number> {
  const written = await writeOr(con, () => writeSweep(dir, result, input));
  if (written === null) return EXIT.badInput;
  const text = sweepSummary(result, written);
  if (opts.json) {
    con.out(sweepJson(result));
    con.err(text);
  } else con.out(text);
  return worstExit([...result.points, ...(result.design ? [result.design] : [])].map((o) => (o.verdict === 'error' ? EXIT.fault : EXIT.ok)));
}
