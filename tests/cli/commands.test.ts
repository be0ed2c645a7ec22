// The command line in-process: help, version, refusals, stock --out, and
// exit code 3 for a fault of the tool.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { run } from '../../cli/run.ts';
import { COMMANDS } from '../../cli/declarations/index.ts';
import { STOCK_FILES } from '../../cli/declarations/stock-files.ts';
import { RIDE_CASES } from '../../src/core/ride/ride-model.ts';
import { freshDir, REPO, runCli } from '../support/run-cli.ts';
import pkg from '../../package.json' with { type: 'json' };
import instanceSchema from '../../src/core/stock/instance.schema.json' with { type: 'json' };

let dir: string;
beforeAll(async () => {
  dir = await freshDir('axletree-cli-');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const noStack = (text: string) => expect(text).not.toMatch(/\n\s+at /);

describe('help and version', () => {
  it.each(COMMANDS.map((c) => [c.name, c] as const))('%s --help: usage, every option, an example, the exit codes', async (name, c) => {
    const r = await runCli([name, '--help'], dir);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(r.out).toContain(`usage: axletree ${name}`);
    for (const option of Object.keys(c.options)) expect(r.out).toContain(`--${option}`);
    expect(r.out).toMatch(/\nexample:\n {2}axletree /);
    const codes = r.out.slice(r.out.indexOf('\nexit codes:\n'));
    for (const n of [0, 1, 2, 3, 130]) expect(codes).toMatch(new RegExp(`\\n {2}${n} {2,}\\w`));
    // `axletree help <command>` says the same.
    expect((await runCli(['help', name], dir)).out).toBe(r.out);
  });

  it('--version prints the version in package.json', async () => {
    expect(await runCli(['--version'], dir)).toEqual({ code: 0, out: `axletree ${pkg.version}\n`, err: '' });
  });

  it('help, and axletree alone, print the overview of every command', async () => {
    const alone = await runCli([], dir);
    expect(alone.code).toBe(0);
    for (const c of COMMANDS) expect(alone.out).toContain(`axletree ${c.name} `);
    expect((await runCli(['help'], dir)).out).toBe(alone.out);
  });

  it('stock --help describes every key of the instance schema, with an example', async () => {
    const { out } = await runCli(['stock', '--help'], dir);
    const keys = (s: { properties?: object; items?: object }): string[] =>
      Object.entries(s.properties ?? {}).flatMap(([k, v]) => [k, ...keys(v.items ?? v)]);
    for (const key of keys(instanceSchema)) expect(out).toMatch(new RegExp(`\\n {2,}${key} `));
    expect(out).toContain('"kerf_mm": 3');
  });

  it('ride takes exactly the cases the ride model has', () => {
    expect(COMMANDS.find((c) => c.name === 'ride')?.options.case.choices).toEqual(RIDE_CASES);
  });
});

describe('refused options: exit 2, one line', () => {
  it('an unknown option names the nearest valid one', async () => {
    const r = await runCli(['check', 'spec.yaml', '--jsn'], dir);
    expect(r).toEqual({ code: 2, out: '', err: 'axletree check: unknown option --jsn; did you mean --json?\n' });
  });

  it('an option the command does not take is refused, never ignored', async () => {
    const r = await runCli(['rules', '--case', 'drop'], dir);
    expect(r).toEqual({ code: 2, out: '', err: 'axletree rules: option --case is for ride, not rules; rules takes --json, --help\n' });
  });

  it('an option before the command, and an unknown command', async () => {
    expect(await runCli(['--json', 'check', 'x.yaml'], dir)).toMatchObject({ code: 2, err: 'axletree: option --json goes after the command, as in axletree check ... --json\n' });
    expect(await runCli(['chek', 'x.yaml'], dir)).toMatchObject({ code: 2, err: 'axletree: unknown command "chek"; did you mean check?\n' });
  });
});

const INSTANCE = { kerf_mm: 3, stock: [{ length_mm: 3000 }], pieces: [{ length_mm: 742, quantity: 5, label: 'spoke' }] };

describe('stock --out', () => {
  it('writes the plan as JSON and as text', async () => {
    await writeFile(join(dir, 'cuts.json'), JSON.stringify(INSTANCE));
    const r = await runCli(['stock', 'cuts.json', '--out', 'plan', '--json'], dir);
    expect(r.code).toBe(0);
    expect(await readdir(join(dir, 'plan'))).toEqual([STOCK_FILES.json, STOCK_FILES.text, 'manifest.json'].sort());
    expect(await readFile(join(dir, 'plan', STOCK_FILES.json), 'utf8')).toBe(r.out);
    expect(r.err).toContain(join(dir, 'plan', STOCK_FILES.text));
    const text = await runCli(['stock', 'cuts.json'], dir);
    expect(await readFile(join(dir, 'plan', STOCK_FILES.text), 'utf8')).toBe(text.out);
  });

  it('refuses to write over its input', async () => {
    await writeFile(join(dir, STOCK_FILES.json), JSON.stringify(INSTANCE));
    const r = await runCli(['stock', STOCK_FILES.json, '--out', '.'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('refusing to write');
    expect(JSON.parse(await readFile(join(dir, STOCK_FILES.json), 'utf8'))).toEqual(INSTANCE);
  });
});

describe('a fault of the tool: exit 3', () => {
  it('a rule that cannot run makes the verdict error', async () => {
    // A trial step of 1e308 mm moves the axle to infinity: the balance note
    // reports a non-finite number, which the rule context refuses.
    const rules = join(dir, 'rules');
    cpSync(join(REPO, 'rules'), rules, { recursive: true });
    const file = join(rules, 'limits', 'balance.yaml');
    const text = readFileSync(file, 'utf8');
    const changed = text.replace(/(balance\.axle-position:\n {2}step_mm:\n {4}value: )50\n/, '$11.0e+308\n');
    expect(changed).not.toBe(text);
    writeFileSync(file, changed);
    let out = '';
    let err = '';
    const code = await run(['check', '--no-decisive', join(REPO, 'specs', 'demo-two-crew.yaml'), '--out', join(dir, 'faulty')], { out: (s) => (out += s), err: (s) => (err += s), cwd: dir, rulesDir: rules });
    expect(code).toBe(3);
    expect(out).toMatch(/verdict: ERROR/);
    expect(out).toMatch(/balance\.axle-position {2}The rule balance\.axle-position could not run/);
    noStack(out + err);
  });

  it('an uncaught fault is one line naming it as a fault of the tool', async () => {
    let err = '';
    const code = await run(['rules'], { out: () => { throw new TypeError('the terminal went away'); }, err: (s) => (err += s), cwd: dir });
    expect(code).toBe(3);
    expect(err).toMatch(/^axletree: internal fault \(a fault of the tool, not of your input\): TypeError: the terminal went away \(at [^)]+\); please report it\.\n$/);
  });
});

describe('check: what decides the verdict', () => {
  it('result.json lists the decisive inputs by default and leaves them out with --no-decisive', async () => {
    const here = await freshDir('axletree-decisive-');
    const demo = join(REPO, 'specs', 'demo-two-crew.yaml');
    const withSearch = await runCli(['check', demo, '--out', 'a', '--json'], here);
    expect(withSearch.code).toBe(0);
    const r = JSON.parse(withSearch.out) as { decisive_inputs?: { input: string; status: string }[]; decisive_search?: { reruns: number } };
    expect(r.decisive_inputs!.length).toBeGreaterThan(0);
    expect(r.decisive_search!.reruns).toBeGreaterThan(0);
    expect(readFileSync(join(here, 'a', 'report.md'), 'utf8')).toContain('What decides the verdict');
    const without = await runCli(['check', demo, '--out', 'b', '--json', '--no-decisive'], here);
    expect(JSON.parse(without.out)).not.toHaveProperty('decisive_inputs');
  }, 180_000);
});
