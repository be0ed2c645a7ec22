import { cpSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import { mkdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from '../../cli/run.ts';
import { severityRank } from '../../src/core/findings/severity.ts';
import type { Finding } from '../../src/core/findings/finding.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';
import type { ReviewTable } from '../../src/core/review/review-table.ts';
import { MANIFEST, setIsComplete } from '../../src/node/write-file-set.ts';
import { freshDir, REPO, runCli, replaceOnce } from '../support/run-cli.ts';
import { csvRows } from './csv-rows.ts';

// `axletree check` of several specifications: each proposal's outputs as a
// single check writes them, and one review table. The reference for every
// row is the separate check of the same file.

const spec = (name: string) => join(REPO, 'specs', `${name}.yaml`);
const DEMOS = ['demo-two-crew', 'demo-rear-axle'];
const REVIEW_SET = ['review.html', 'review.xlsx', 'review.csv'];
const manifestNames = async (dir: string) => (JSON.parse(await readFile(join(dir, MANIFEST), 'utf8')) as { files: { name: string }[] }).files.map((f) => f.name);

type Table = ReviewTable & { written: string[] };

/** No finding of the check is worse than the last one shown, unless shown: the shown ones are the worst. */
function worse(a: Pick<Finding, 'severity' | 'utilisation'>, b: Pick<Finding, 'severity' | 'utilisation'>): boolean {
  const d = severityRank(a.severity) - severityRank(b.severity);
  return d > 0 || (d === 0 && (a.utilisation ?? -1) > (b.utilisation ?? -1));
}

describe('a batch review', () => {
  it('agrees with the separate checks of two demos: verdicts, worst findings, cost, mass, and the same outputs', async () => {
    const dir = await freshDir('axletree-batch-');
    const separate: { result: CheckResult; code: number }[] = [];
    for (const d of DEMOS) {
      const r = await runCli(['check', spec(d), '--out', join('alone', d), '--json', '--no-decisive'], dir);
      separate.push({ result: JSON.parse(r.out) as CheckResult, code: r.code });
    }
    const batch = await runCli(['check', ...DEMOS.map(spec), '--out', 'review', '--json', '--no-decisive', '--jobs', '2'], dir);
    expect(batch.code).toBe(Math.max(...separate.map((s) => s.code)));
    const table = JSON.parse(batch.out) as Table;
    expect(table.rows.map((r) => r.name)).toEqual(DEMOS);
    table.rows.forEach((row, i) => {
      const { result } = separate[i];
      expect(row).toMatchObject({ status: 'checked', build: result.spec_name, verdict: result.verdict, error: null, decisive: null, report: `${DEMOS[i]}/report.html` });
      expect(row.cost).toBe(result.cutting.stock_plan.cost);
      expect(row.total_mass_kg).toBe(result.mass.total_mass_kg);
      expect(row.load_per_horse_n).toBe(result.figures.yoke_load_per_horse.value);
      expect(row.axle_load_n).toBe(result.figures.axle_load.value);
      // Each shown finding is one of the check's, worst first, and none left out is worse than the last shown.
      expect(row.worst).toHaveLength(3);
      for (const w of row.worst) expect(result.findings).toContainEqual(expect.objectContaining({ rule: w.rule, subject: w.subject, severity: w.severity, utilisation: w.utilisation }));
      for (let k = 1; k < row.worst.length; k++) expect(worse(row.worst[k], row.worst[k - 1])).toBe(false);
      const shown = new Set(row.worst.map((w) => `${w.rule}|${w.subject}`));
      const left = result.findings.filter((f) => f.severity !== 'info' && !shown.has(`${f.rule}|${f.subject}`));
      expect(left.filter((f) => worse(f, row.worst[2]))).toEqual([]);
      // The proposal's own outputs are the single check's, byte for byte.
      const own = (base: string, f: string) => readFileSync(join(dir, base, DEMOS[i], f), 'utf8');
      expect(own('review', 'result.json')).toBe(own('alone', 'result.json'));
      expect(own('review', 'report.md')).toBe(own('alone', 'report.md'));
    });
    // One set: the three table files and the manifest that matches them.
    expect(await manifestNames(join(dir, 'review'))).toEqual(REVIEW_SET);
    expect(await setIsComplete(join(dir, 'review'))).toBe(true);
    const csv = csvRows(readFileSync(join(dir, 'review', 'review.csv'), 'utf8'));
    expect(csv.slice(1, 3).map((r) => [r[0], r[2]])).toEqual(DEMOS.map((d, i) => [spec(d), separate[i].result.verdict]));
    const html = readFileSync(join(dir, 'review', 'review.html'), 'utf8');
    for (const d of DEMOS) expect(html).toContain(`<a href="${d}/report.html">`);
    expect(html).toContain('Decisive inputs: not searched (--no-decisive).');
  }, 180_000);

  it('makes a bad file a row with its located error, and exits with the highest code of the set', async () => {
    const dir = await freshDir('axletree-batch-');
    const text = readFileSync(spec('demo-two-crew'), 'utf8');
    writeFileSync(join(dir, 'bad.yaml'), replaceOnce(text, 'spokes: 6', 'spokes: six'));
    writeFileSync(join(dir, 'notes.txt'), 'not a specification');
    const r = await runCli(['check', 'bad.yaml', spec('teaching-flawed'), 'notes.txt', '--json', '--no-decisive', '--jobs', '1'], dir);
    // refused (2) is above a failing finding (1).
    expect(r.code).toBe(2);
    const table = JSON.parse(r.out) as Table;
    expect(table.rows.map((x) => [x.name, x.status, x.verdict])).toEqual([
      ['bad', 'refused', null],
      ['teaching-flawed', 'checked', 'fail'],
      ['notes', 'refused', null],
    ]);
    // The separate check's message for the same file, its first problem line.
    const alone = await runCli(['check', 'bad.yaml'], dir);
    expect(alone.code).toBe(2);
    expect(table.rows[0].error).toBe(alone.err.split('\n')[1].trim());
    expect(table.rows[0].error).toMatch(/^wheels\.spokes \(line \d+, column \d+\): /);
    expect(table.rows[2].error).toContain('notes.txt');
    expect(existsSync(join(dir, 'axletree-out', 'review', 'review.html'))).toBe(true);
    expect(existsSync(join(dir, 'axletree-out', 'review', 'bad'))).toBe(false);
  }, 180_000);

  it('exits 3 where a rule could not run, above a refused file', async () => {
    const dir = await freshDir('axletree-batch-');
    // As in the CLI's fault test: a trial step of 1e308 mm makes a rule refuse a non-finite number.
    const rules = join(dir, 'rules');
    cpSync(join(REPO, 'rules'), rules, { recursive: true });
    const file = join(rules, 'limits', 'balance.yaml');
    writeFileSync(file, readFileSync(file, 'utf8').replace(/(balance\.axle-position:\n {2}step_mm:\n {4}value: )50\n/, '$11.0e+308\n'));
    let out = '';
    const code = await run(['check', spec('demo-two-crew'), 'missing.yaml', '--json', '--no-decisive'], { out: (s) => (out += s), err: () => undefined, cwd: dir, rulesDir: rules });
    expect(code).toBe(3);
    expect((JSON.parse(out) as Table).rows.map((x) => [x.status, x.verdict])).toEqual([
      ['checked', 'error'],
      ['refused', null],
    ]);
  }, 180_000);

  it('expands a folder to the specifications in it; a folder alone is a batch', async () => {
    const dir = await freshDir('axletree-batch-');
    await mkdir(join(dir, 'pile', 'older'), { recursive: true });
    for (const f of ['trade-light-two-crew', 'tutankhamun-light-chariot']) cpSync(join(REPO, 'specs', 'validation', `${f}.yaml`), join(dir, 'pile', `${f}.yaml`));
    cpSync(join(REPO, 'specs', 'floor-test-demo.csv'), join(dir, 'pile', 'drop.csv'));
    cpSync(spec('teaching-flawed'), join(dir, 'pile', 'older', 'teaching-flawed.yaml'));
    const r = await runCli(['check', 'pile', '--out', 'rev', '--json', '--no-decisive', '--jobs', '1'], dir);
    const table = JSON.parse(r.out) as Table;
    expect(table.rows.map((x) => [x.file, x.status])).toEqual([
      [join('pile', 'trade-light-two-crew.yaml'), 'checked'],
      [join('pile', 'tutankhamun-light-chariot.yaml'), 'checked'],
    ]);
    expect(r.code).toBe(Math.max(...table.rows.map((x) => (x.verdict === 'fail' ? 1 : 0))));
    expect(await setIsComplete(join(dir, 'rev', 'trade-light-two-crew'))).toBe(true);
  }, 180_000);

  it('stops at Ctrl-C after the proposal in hand and writes the table of those finished as a complete set', async () => {
    const dir = await freshDir('axletree-batch-');
    const files = ['trade-light-two-crew', 'tutankhamun-light-chariot', 'nova-replica-two-crew'].map((f) => join(REPO, 'specs', 'validation', `${f}.yaml`));
    const stop = new AbortController();
    let kept = false;
    let out = '';
    let err = '';
    const code = await run(['check', ...files, '--out', 'rev', '--json', '--no-decisive', '--jobs', '1'], {
      out: (s) => (out += s),
      err: (s) => {
        err += s;
        // The first progress line says one proposal is done: Ctrl-C then.
        if (/"done":1\b/.test(s)) stop.abort();
      },
      cwd: dir,
      stop: stop.signal,
      keepPartial: () => (kept = true),
    });
    expect(kept).toBe(true);
    expect(stop.signal.aborted).toBe(true);
    const table = JSON.parse(out) as Table;
    expect(table.rows.map((x) => x.file)).toEqual([files[0]]);
    expect(table).toMatchObject({ given: 3, stopped: true, not_checked: files.slice(1) });
    // Stopped: 130 whatever the finished row found, so a script never takes part of a batch for all of it.
    expect(code).toBe(130);
    expect(err).toMatch(/"finished":false,"stopped":true/);
    // A complete, smaller set: the manifest matches the three files, which hold the finished row only.
    const rev = join(dir, 'rev');
    expect(await manifestNames(rev)).toEqual(REVIEW_SET);
    expect(await setIsComplete(rev)).toBe(true);
    const csv = csvRows(readFileSync(join(rev, 'review.csv'), 'utf8'));
    expect(csv[1][0]).toBe(files[0]);
    expect(csv[2]).toEqual(['']);
    expect(readFileSync(join(rev, 'review.html'), 'utf8')).toContain('Stopped at Ctrl-C');
    expect(existsSync(join(rev, 'tutankhamun-light-chariot'))).toBe(false);
  }, 180_000);

  it('refuses a --jobs that is not a whole number of 1 or more, writing nothing', async () => {
    const dir = await freshDir('axletree-batch-');
    for (const v of ['0', 'two', '1.5']) {
      expect(await runCli(['check', spec('demo-two-crew'), spec('demo-rear-axle'), '--jobs', v], dir)).toEqual({ code: 2, out: '', err: `axletree check: option --jobs takes a whole number of 1 or more (got "${v}")\n` });
    }
    expect(existsSync(join(dir, 'axletree-out'))).toBe(false);
  });

  it('checks one file as before: its outputs in axletree-out/<name>/, no review table', async () => {
    const dir = await freshDir('axletree-batch-');
    const r = await runCli(['check', spec('demo-two-crew'), '--no-decisive'], dir);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^Oak-hollow two-crew chariot, central axle\nverdict: ADVICE/);
    expect(existsSync(join(dir, 'axletree-out', 'demo-two-crew', 'report.html'))).toBe(true);
    expect(existsSync(join(dir, 'axletree-out', 'review'))).toBe(false);
  }, 180_000);
});
