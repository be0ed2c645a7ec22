// `npm run fuzz [-- --cases N --seed S --jobs J]`: mutated specifications
// (tests/support/spec-mutations.ts) checked as whole processes, the way a user
// runs them: each must exit 0, 1 or 2 within 10 s, stay under 1 GB, write
// nothing when it refuses its input and put no NaN or Infinity in result.json.
// Prints each violation with its case (seeded: a run repeats) and a summary.
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import fc from 'fast-check';
import { stringify } from 'yaml';
import { REPO } from '../tests/support/run-cli.ts';
import { caseArb, mutated, nonFinite, type MutationCase } from '../tests/support/spec-mutations.ts';

const { values } = parseArgs({ options: { cases: { type: 'string', default: '10000' }, seed: { type: 'string', default: '1' }, jobs: { type: 'string', default: String(availableParallelism()) } } });
const CASES = Number(values.cases);
const JOBS = Math.max(1, Number(values.jobs));
const TIMEOUT_MS = 10_000;
const MEMORY_KB = 1024 * 1024;
const BIN = join(REPO, 'bin', 'axletree.mjs');
const TIME = existsSync('/usr/bin/time') ? '/usr/bin/time' : null;

const cases = fc.sample(caseArb, { seed: Number(values.seed), numRuns: CASES }) as MutationCase[];
const counts = new Map<string, number>();
const problems: string[] = [];

function runOne(c: MutationCase, k: number): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'axletree-fuzz-'));
  writeFileSync(join(dir, 'spec.yaml'), stringify(mutated(c)));
  const args = [BIN, 'check', 'spec.yaml', '--out', 'out', '--json', '--no-decisive'];
  const [cmd, argv] = TIME ? [TIME, ['-f', '%M', process.execPath, ...args]] : [process.execPath, args];
  return new Promise((done) => {
    const child = spawn(cmd, argv, { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.stderr.on('data', (d: Buffer) => (err += d.toString()));
    const timer = setTimeout(() => child.kill('SIGKILL'), TIMEOUT_MS);
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      const say = (what: string) => problems.push(`case ${k} (${what}): ${JSON.stringify(c).slice(0, 400)}\n  ${err.split('\n').slice(0, 3).join('\n  ')}`);
      const key = signal ? `killed (${signal})` : `exit ${code}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
      if (signal) say(`over ${TIMEOUT_MS / 1000} s`);
      else if (code !== 0 && code !== 1 && code !== 2) say(`exit ${code}`);
      const kb = TIME ? Number(err.trim().split('\n').at(-1)) : NaN;
      if (kb > MEMORY_KB) say(`${Math.round(kb / 1024)} MB`);
      if (code === 2 && existsSync(join(dir, 'out'))) say('a refused input wrote outputs');
      if ((code === 0 || code === 1) && out) {
        try {
          const bad = nonFinite(JSON.parse(out));
          if (bad.length) say(`non-finite numbers at ${bad.slice(0, 3).join(', ')}`);
        } catch {
          say('result.json is not JSON');
        }
        if (/\bNaN\b|\bInfinity\b/.test(readFileSync(join(dir, 'out', 'result.json'), 'utf8'))) say('NaN or Infinity in result.json');
      }
      rmSync(dir, { recursive: true, force: true });
      done();
    });
  });
}

let next = 0;
const started = Date.now();
await Promise.all(
  Array.from({ length: JOBS }, async () => {
    while (next < cases.length) {
      const k = next++;
      await runOne(cases[k], k);
      if ((k + 1) % 100 === 0) console.error(`${k + 1}/${cases.length} cases, ${problems.length} problems, ${((Date.now() - started) / 1000).toFixed(0)} s`);
    }
  }),
);
console.log(`${cases.length} cases (seed ${values.seed}, ${JOBS} at a time, ${((Date.now() - started) / 1000).toFixed(0)} s): ${[...counts].map(([k, n]) => `${k} ${n}`).join(', ')}`);
for (const p of problems) console.log(p);
process.exitCode = problems.length ? 1 : 0;
