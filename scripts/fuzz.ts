// `npm run fuzz [-- --cases N --seed S --jobs J --from A --to B]`: mutated
// specifications (tests/support/spec-mutations.ts) checked as whole processes,
// the way a user runs them: each must exit 0, 1 or 2 within 10 s of CPU time,
// stay under 1 GB, write nothing when it refuses its input and put no NaN or
// Infinity in result.json. Prints each violation with its case (seeded: a run
// repeats) and a summary. `--from`/`--to` run a slice of the N cases, so a long
// campaign can run in parts (the same seed gives the same cases); CPU time,
// not wall time, judges a hang, so a campaign may run at low priority beside
// other work (a wall-clock limit of six times the CPU limit still stops a
// process that waits forever).
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import fc from 'fast-check';
import { stringify } from 'yaml';
import { REPO } from '../tests/support/run-cli.ts';
import { caseArb, mutated, nonFinite, type MutationCase } from '../tests/support/spec-mutations.ts';

const { values } = parseArgs({ options: { cases: { type: 'string', default: '10000' }, seed: { type: 'string', default: '1' }, jobs: { type: 'string', default: String(availableParallelism()) }, from: { type: 'string', default: '0' }, to: { type: 'string' } } });
const CASES = Number(values.cases);
const JOBS = Math.max(1, Number(values.jobs));
const FROM = Number(values.from);
const TO = Math.min(CASES, Number(values.to ?? CASES));
const CPU_LIMIT_S = 10;
const TIMEOUT_MS = 6 * CPU_LIMIT_S * 1000;
const MEMORY_KB = 1024 * 1024;
const BIN = join(REPO, 'bin', 'axletree.mjs');
const TIME = existsSync('/usr/bin/time') ? '/usr/bin/time' : null;

const cases = fc.sample(caseArb, { seed: Number(values.seed), numRuns: CASES }) as MutationCase[];
const counts = new Map<string, number>();
const problems: string[] = [];
const NOT_A_NUMBER = /\bNaN\b|\bInfinity\b/;
const worstCpu = { s: 0, k: -1 };
const worstKb = { kb: 0, k: -1 };

function runOne(c: MutationCase, k: number): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'axletree-fuzz-'));
  writeFileSync(join(dir, 'spec.yaml'), stringify(mutated(c)));
  const args = [BIN, 'check', 'spec.yaml', '--out', 'out', '--json', '--no-decisive'];
  const [cmd, argv] = TIME ? [TIME, ['-f', '%M %U %S', process.execPath, ...args]] : [process.execPath, args];
  return new Promise((done) => {
    const child = spawn(cmd, argv, { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.stderr.on('data', (d: Buffer) => (err += d.toString()));
    const timer = setTimeout(() => child.kill('SIGKILL'), TIMEOUT_MS);
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      // Printed as found, so a campaign stopped part way still shows them.
      const say = (what: string) => {
        problems.push(what);
        console.log(`case ${k} (${what}): ${JSON.stringify(c).slice(0, 400)}\n  ${err.split('\n').slice(0, 3).join('\n  ')}`);
      };
      const key = signal ? `killed (${signal})` : `exit ${code}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
      if (signal) say(`still running after ${TIMEOUT_MS / 1000} s of wall time`);
      else if (code !== 0 && code !== 1 && code !== 2) say(`exit ${code}`);
      const [kb, user, sys] = TIME ? err.trim().split('\n').at(-1)!.split(' ').map(Number) : [NaN, NaN, NaN];
      if (kb > MEMORY_KB) say(`${Math.round(kb / 1024)} MB`);
      if (user + sys > CPU_LIMIT_S) say(`${(user + sys).toFixed(1)} s of CPU time`);
      if (user + sys > worstCpu.s) Object.assign(worstCpu, { s: user + sys, k });
      if (kb > worstKb.kb) Object.assign(worstKb, { kb, k });
      if (code === 2 && existsSync(join(dir, 'out'))) say('a refused input wrote outputs');
      if ((code === 0 || code === 1) && out) {
        try {
          const bad = nonFinite(JSON.parse(out));
          if (bad.length) say(`non-finite numbers at ${bad.slice(0, 3).join(', ')}`);
        } catch {
          say('result.json is not JSON');
        }
        // Text the case itself wrote (a crew role "NaN") comes back as given; only a figure's NaN counts.
        if (!NOT_A_NUMBER.test(JSON.stringify(c)) && NOT_A_NUMBER.test(readFileSync(join(dir, 'out', 'result.json'), 'utf8'))) say('NaN or Infinity in result.json');
      }
      rmSync(dir, { recursive: true, force: true });
      done();
    });
  });
}

let next = FROM;
const started = Date.now();
await Promise.all(
  Array.from({ length: JOBS }, async () => {
    while (next < TO) {
      const k = next++;
      await runOne(cases[k], k);
      if ((k + 1) % 100 === 0) console.error(`${k + 1}/${TO} cases, ${problems.length} problems, ${((Date.now() - started) / 1000).toFixed(0)} s`);
    }
  }),
);
console.log(`cases ${FROM}..${TO - 1} of ${CASES} (seed ${values.seed}, ${JOBS} at a time, ${((Date.now() - started) / 1000).toFixed(0)} s): ${[...counts].map(([k, n]) => `${k} ${n}`).join(', ')}`);
if (TIME) console.log(`most CPU time ${worstCpu.s.toFixed(2)} s (case ${worstCpu.k}); most memory ${(worstKb.kb / 1024).toFixed(0)} MB (case ${worstKb.k})`);
console.log(`${problems.length} problems`);
process.exitCode = problems.length ? 1 : 0;
